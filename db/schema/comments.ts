/**
 * Comments on revisions. First version by the foundation; the review area owns it from here.
 */
import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './core';
import { revisions } from './designs';

export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => revisions.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('comments_revision_idx').on(t.revisionId)],
);
