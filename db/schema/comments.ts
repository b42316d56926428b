/**
 * Comments on revisions and their image attachments. Owned by the review area.
 * A comment may answer another (parentId) and may point at a script line or at a mask point (µm);
 * deleting a comment keeps its row (deletedAt) so replies keep their place in the thread.
 */
import { sql } from 'drizzle-orm';
import { type AnyPgColumn, check, doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './core';
import { bytea, revisions } from './designs';

const stamp = (name: string) => timestamp(name, { withTimezone: true, mode: 'date' });

export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => revisions.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    /** the comment this one answers; null for a thread's first comment */
    parentId: uuid('parent_id').references((): AnyPgColumn => comments.id, { onDelete: 'cascade' }),
    /** anchor on a script line (1-based) ... */
    anchorLine: integer('anchor_line'),
    /** ... or on a point of the mask, in µm */
    anchorXUm: doublePrecision('anchor_x_um'),
    anchorYUm: doublePrecision('anchor_y_um'),
    createdAt: stamp('created_at').notNull().defaultNow(),
    editedAt: stamp('edited_at'),
    deletedAt: stamp('deleted_at'),
  },
  (t) => [
    index('comments_revision_idx').on(t.revisionId),
    index('comments_parent_idx').on(t.parentId),
    check(
      'comments_one_anchor',
      sql`(${t.anchorLine} IS NULL OR (${t.anchorXUm} IS NULL AND ${t.anchorYUm} IS NULL)) AND ((${t.anchorXUm} IS NULL) = (${t.anchorYUm} IS NULL))`,
    ),
  ],
);

/** Images attached to comments (inspection photos), bytes and thumbnail kept in the database. */
export const commentAttachments = pgTable(
  'comment_attachments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    commentId: uuid('comment_id')
      .notNull()
      .references(() => comments.id, { onDelete: 'cascade' }),
    uploaderId: uuid('uploader_id').references(() => users.id, { onDelete: 'set null' }),
    fileName: text('file_name').notNull(),
    /** read from the content, never from the name */
    mime: text('mime').notNull(),
    byteSize: integer('byte_size').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    sha256: text('sha256').notNull(),
    content: bytea('content').notNull(),
    thumbnail: bytea('thumbnail').notNull(),
    thumbnailWidth: integer('thumbnail_width').notNull(),
    thumbnailHeight: integer('thumbnail_height').notNull(),
    createdAt: stamp('created_at').notNull().defaultNow(),
  },
  (t) => [index('comment_attachments_comment_idx').on(t.commentId)],
);
