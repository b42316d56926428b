/** Written into every manifest so a bundle can be traced to the code that made it; raise on any change to the output. */
export const ENGINE_VERSION = 'zonewright-engine 0.1.0';
