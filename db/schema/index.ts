// Every table, for drizzle-kit and for typed queries. Add a line here when you add a schema file.
export * from './core';
export * from './designs';
export * from './comments';
