/**
 * Designs and their saved revisions. First version by the foundation; the workspace area owns it from here.
 */
import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { teams, users } from './core';

export const designs = pgTable(
  'designs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    /** Fabrication process settings (grid, layers, minimum feature...); shape owned by the workspace area. */
    processProfile: jsonb('process_profile').$type<Record<string, unknown>>().notNull().default({}),
    /** The script as last edited, saved or not. */
    workingScript: text('working_script').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('designs_team_idx').on(t.teamId)],
);

export const revisions = pgTable(
  'revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    designId: uuid('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    /** 1, 2, 3... per design. */
    number: integer('number').notNull(),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    message: text('message').notNull().default(''),
    /** The script exactly as saved. */
    source: text('source').notNull(),
    /** A state from lib/workflow/states.ts. */
    state: text('state').notNull().default('draft'),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('revisions_design_number_unique').on(t.designId, t.number)],
);
