import { z } from 'zod';

export const MAX_COMMENT_LENGTH = 10_000;

const finiteMicrometres = z.number('must be a number of µm').min(-1e6, 'must be within ±1 m').max(1e6, 'must be within ±1 m');

/** Where a comment points: a script line (1-based) or a point on the mask (µm). */
export const commentAnchorSchema = z.union([
  z.object({ line: z.number().int('line must be a whole number').min(1, 'lines start at 1').max(1_000_000) }).strict(),
  z.object({ x_um: finiteMicrometres, y_um: finiteMicrometres }).strict(),
]);
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

const bodySchema = z
  .string()
  .trim()
  .min(1, 'Write something first.')
  .max(MAX_COMMENT_LENGTH, `A comment is at most ${MAX_COMMENT_LENGTH} characters.`);

/** POST /api/revisions/{id}/comments */
export const createCommentSchema = z.object({
  body: bodySchema,
  parentId: z.uuid('parentId must be a comment id').nullish(),
  anchor: commentAnchorSchema.nullish(),
});
export type CreateComment = z.infer<typeof createCommentSchema>;

/** PATCH /api/comments/{id}: the new text, and the edit time the page saw (stale edits are refused). */
export const editCommentSchema = z.object({
  body: bodySchema,
  expectedEditedAt: z.iso.datetime({ offset: true }).nullish(),
});
export type EditComment = z.infer<typeof editCommentSchema>;

/** A comment as the API returns it. */
export interface CommentView {
  id: string;
  revisionId: string;
  parentId: string | null;
  author: { id: string; name: string; email: string } | null;
  body: string;
  anchor: CommentAnchor | null;
  createdAt: string;
  editedAt: string | null;
  deletedAt: string | null;
  attachments: AttachmentView[];
  /** what the signed-in user may do with it */
  canEdit: boolean;
  canDelete: boolean;
}

export interface AttachmentView {
  id: string;
  fileName: string;
  mime: string;
  byteSize: number;
  width: number;
  height: number;
  thumbnailWidth: number;
  thumbnailHeight: number;
  url: string;
  thumbnailUrl: string;
}
