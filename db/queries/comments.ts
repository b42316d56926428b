/**
 * Threaded comments on revisions, their @mentions and image attachments. Every function checks
 * the caller's rights through `can` and answers a refusal with the HTTP status to use.
 */
import { createHash } from 'node:crypto';
import { and, asc, count, eq, inArray, isNull } from 'drizzle-orm';
import { db } from '..';
import { commentAttachments, comments, users } from '../schema';
import { can } from '../../lib/auth/permissions';
import { MAX_IMAGE_BYTES, checkImageUpload, makeThumbnail } from '../../lib/images';
import { sendMail } from '../../lib/mail';
import { mentionEmail } from '../../lib/mail/templates';
import { resolveMentions } from '../../lib/workflow/mentions';
import { wantsEmail, type MemberContact } from '../../lib/workflow/notifications';
import type { AttachmentView, CommentAnchor, CommentView } from '../../lib/schemas/comments';
import { REVISION_NOT_FOUND, displayName, isId, loadRevisionAccess, refuse, teamContacts, type Outcome, type RevisionAccess } from './review';

export const MAX_ATTACHMENTS_PER_COMMENT = 6;
const COMMENT_NOT_FOUND = 'No such comment, or it belongs to a team you are not in.';

type CommentRow = typeof comments.$inferSelect;
type AttachmentMeta = Omit<typeof commentAttachments.$inferSelect, 'content' | 'thumbnail'>;

function anchorOf(row: CommentRow): CommentAnchor | null {
  if (row.anchorLine !== null) return { line: row.anchorLine };
  if (row.anchorXUm !== null && row.anchorYUm !== null) return { x_um: row.anchorXUm, y_um: row.anchorYUm };
  return null;
}

/** How an anchor reads in an e-mail or a list. */
export function describeAnchor(anchor: CommentAnchor | null): string | null {
  if (!anchor) return null;
  if ('line' in anchor) return `line ${anchor.line}`;
  return `mask point x = ${anchor.x_um} µm, y = ${anchor.y_um} µm`;
}

function attachmentView(a: AttachmentMeta): AttachmentView {
  return {
    id: a.id,
    fileName: a.fileName,
    mime: a.mime,
    byteSize: a.byteSize,
    width: a.width,
    height: a.height,
    thumbnailWidth: a.thumbnailWidth,
    thumbnailHeight: a.thumbnailHeight,
    url: `/api/attachments/${a.id}`,
    thumbnailUrl: `/api/attachments/${a.id}/thumbnail`,
  };
}

const attachmentMeta = {
  id: commentAttachments.id,
  commentId: commentAttachments.commentId,
  uploaderId: commentAttachments.uploaderId,
  fileName: commentAttachments.fileName,
  mime: commentAttachments.mime,
  byteSize: commentAttachments.byteSize,
  width: commentAttachments.width,
  height: commentAttachments.height,
  sha256: commentAttachments.sha256,
  thumbnailWidth: commentAttachments.thumbnailWidth,
  thumbnailHeight: commentAttachments.thumbnailHeight,
  createdAt: commentAttachments.createdAt,
};

async function toViews(rows: CommentRow[], access: RevisionAccess, viewerId: string): Promise<CommentView[]> {
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const authorIds = [...new Set(rows.map((r) => r.authorId).filter((id): id is string => id !== null))];
  const [authors, attachments] = await Promise.all([
    authorIds.length ? db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, authorIds)) : [],
    db.select(attachmentMeta).from(commentAttachments).where(inArray(commentAttachments.commentId, ids)).orderBy(asc(commentAttachments.createdAt)),
  ]);
  const actor = { userId: viewerId, role: access.role };
  return rows.map((row) => {
    const deleted = row.deletedAt !== null;
    const author = authors.find((a) => a.id === row.authorId) ?? null;
    return {
      id: row.id,
      revisionId: row.revisionId,
      parentId: row.parentId,
      author: author ? { id: author.id, name: displayName(author), email: author.email } : null,
      body: deleted ? '' : row.body,
      anchor: anchorOf(row),
      createdAt: row.createdAt.toISOString(),
      editedAt: row.editedAt?.toISOString() ?? null,
      deletedAt: row.deletedAt?.toISOString() ?? null,
      attachments: deleted ? [] : attachments.filter((a) => a.commentId === row.id).map(attachmentView),
      canEdit: !deleted && can(actor, 'comment.edit', { authorId: row.authorId }),
      canDelete: !deleted && can(actor, 'comment.delete', { authorId: row.authorId }),
    };
  });
}

/** All comments of a revision, oldest first (the page builds the threads from parentId). */
export async function listComments(revisionId: string, viewerId: string): Promise<Outcome<{ comments: CommentView[] }>> {
  const access = await loadRevisionAccess(db, revisionId, viewerId);
  if (!access || !can({ userId: viewerId, role: access.role }, 'comment.view')) return refuse(404, REVISION_NOT_FOUND);
  const rows = await db.select().from(comments).where(eq(comments.revisionId, revisionId)).orderBy(asc(comments.createdAt), asc(comments.id));
  return { ok: true, comments: await toViews(rows, access, viewerId) };
}

async function loadComment(commentId: string, userId: string): Promise<{ row: CommentRow; access: RevisionAccess } | null> {
  if (!isId(commentId)) return null;
  const [row] = await db.select().from(comments).where(eq(comments.id, commentId));
  if (!row) return null;
  const access = await loadRevisionAccess(db, row.revisionId, userId);
  if (!access || access.role === null) return null;
  return { row, access };
}

async function emailMentions(input: {
  access: RevisionAccess;
  comment: CommentRow;
  actorId: string;
  appUrl: string;
  /** handles already mentioned before an edit; they are not e-mailed again */
  alreadyMentioned?: readonly MemberContact[];
}): Promise<string[]> {
  const members = await teamContacts(db, input.access.design.teamId);
  const mentioned = resolveMentions(input.comment.body, members).members.filter(
    (m) => !input.alreadyMentioned?.some((a) => a.userId === m.userId),
  );
  const recipients = wantsEmail('mention', mentioned, input.actorId);
  const actor = members.find((m) => m.userId === input.actorId);
  const mail = mentionEmail({
    appUrl: input.appUrl,
    teamName: input.access.teamName,
    designName: input.access.design.name,
    revisionId: input.access.revision.id,
    revisionNumber: input.access.revision.number,
    actorName: actor ? displayName(actor) : 'A team member',
    commentId: input.comment.id,
    body: input.comment.body,
    anchor: describeAnchor(anchorOf(input.comment)),
  });
  const sent: string[] = [];
  for (const recipient of recipients) {
    await sendMail({ to: recipient.email, kind: 'mention', ...mail });
    sent.push(recipient.email);
  }
  return sent;
}

export interface CreateCommentInput {
  revisionId: string;
  actorId: string;
  body: string;
  parentId?: string | null;
  anchor?: CommentAnchor | null;
  appUrl: string;
}

export async function createComment(input: CreateCommentInput): Promise<Outcome<{ comment: CommentView; mentioned: string[] }>> {
  const access = await loadRevisionAccess(db, input.revisionId, input.actorId);
  if (!access || access.role === null) return refuse(404, REVISION_NOT_FOUND);
  if (!can({ userId: input.actorId, role: access.role }, 'comment.create')) {
    return refuse(403, `Your role (${access.role}) may read comments but not write them.`);
  }
  if (input.parentId) {
    if (!isId(input.parentId)) return refuse(400, 'The comment you are answering is not on this revision.');
    const [parent] = await db.select({ revisionId: comments.revisionId, deletedAt: comments.deletedAt }).from(comments).where(eq(comments.id, input.parentId));
    if (!parent || parent.revisionId !== input.revisionId) return refuse(400, 'The comment you are answering is not on this revision.');
    if (parent.deletedAt) return refuse(409, 'The comment you are answering was deleted; your reply was not saved. Copy your text and reload.');
  }
  const anchor = input.anchor ?? null;
  if (anchor && 'line' in anchor) {
    const lines = access.revision.source.split('\n').length;
    if (anchor.line > lines) return refuse(400, `Line ${anchor.line} is past the end of this revision's script, which has ${lines} lines.`);
  }
  const [row] = await db
    .insert(comments)
    .values({
      revisionId: input.revisionId,
      authorId: input.actorId,
      body: input.body,
      parentId: input.parentId ?? null,
      anchorLine: anchor && 'line' in anchor ? anchor.line : null,
      anchorXUm: anchor && 'x_um' in anchor ? anchor.x_um : null,
      anchorYUm: anchor && 'y_um' in anchor ? anchor.y_um : null,
    })
    .returning();
  const mentioned = await emailMentions({ access, comment: row, actorId: input.actorId, appUrl: input.appUrl });
  const [view] = await toViews([row], access, input.actorId);
  return { ok: true, comment: view, mentioned };
}

export interface EditCommentInput {
  commentId: string;
  actorId: string;
  body: string;
  /** the edit time the page saw (null: never edited); a different one means someone edited since */
  expectedEditedAt?: string | null;
  appUrl: string;
}

export async function editComment(input: EditCommentInput): Promise<Outcome<{ comment: CommentView; mentioned: string[] }>> {
  const found = await loadComment(input.commentId, input.actorId);
  if (!found) return refuse(404, COMMENT_NOT_FOUND);
  const { row, access } = found;
  if (!can({ userId: input.actorId, role: access.role }, 'comment.edit', { authorId: row.authorId })) {
    return refuse(403, 'Only the author of a comment may edit it.');
  }
  if (row.deletedAt) return refuse(409, 'This comment was deleted; it can no longer be edited.');
  if (input.expectedEditedAt !== undefined) {
    const seen = input.expectedEditedAt === null ? null : new Date(input.expectedEditedAt).getTime();
    if (seen !== (row.editedAt?.getTime() ?? null)) {
      return refuse(409, 'This comment was edited elsewhere since the page was loaded; your change was not saved. Copy your text and reload.');
    }
  }
  const [updated] = await db
    .update(comments)
    .set({ body: input.body, editedAt: new Date() })
    .where(and(eq(comments.id, row.id), isNull(comments.deletedAt), row.editedAt ? eq(comments.editedAt, row.editedAt) : isNull(comments.editedAt)))
    .returning();
  if (!updated) return refuse(409, 'This comment changed while you were editing it; your change was not saved. Copy your text and reload.');
  const members = await teamContacts(db, access.design.teamId);
  const before = resolveMentions(row.body, members).members;
  const mentioned = await emailMentions({ access, comment: updated, actorId: input.actorId, appUrl: input.appUrl, alreadyMentioned: before });
  const [view] = await toViews([updated], access, input.actorId);
  return { ok: true, comment: view, mentioned };
}

/** Deletes a comment's text and attachments but keeps its place, so replies stay in their thread. */
export async function deleteComment(commentId: string, actorId: string): Promise<Outcome<{ comment: CommentView }>> {
  const found = await loadComment(commentId, actorId);
  if (!found) return refuse(404, COMMENT_NOT_FOUND);
  const { row, access } = found;
  if (!can({ userId: actorId, role: access.role }, 'comment.delete', { authorId: row.authorId })) {
    return refuse(403, 'Only the author of a comment or a team owner may delete it.');
  }
  if (row.deletedAt) {
    const [view] = await toViews([row], access, actorId);
    return { ok: true, comment: view };
  }
  const updated = await db.transaction(async (tx) => {
    await tx.delete(commentAttachments).where(eq(commentAttachments.commentId, row.id));
    const [done] = await tx.update(comments).set({ body: '', deletedAt: new Date() }).where(eq(comments.id, row.id)).returning();
    return done;
  });
  const [view] = await toViews([updated], access, actorId);
  return { ok: true, comment: view };
}

function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  const printable = base.replace(/[\u0000-\u001f\u007f"]/g, '').trim();
  return printable.slice(0, 200) || 'image';
}

export async function addAttachment(input: {
  commentId: string;
  actorId: string;
  fileName: string;
  bytes: Uint8Array;
}): Promise<Outcome<{ attachment: AttachmentView }>> {
  const found = await loadComment(input.commentId, input.actorId);
  if (!found) return refuse(404, COMMENT_NOT_FOUND);
  const { row, access } = found;
  if (!can({ userId: input.actorId, role: access.role }, 'comment.edit', { authorId: row.authorId })) {
    return refuse(403, 'Only the author of a comment may attach images to it.');
  }
  if (row.deletedAt) return refuse(409, 'This comment was deleted; nothing can be attached to it.');
  const checked = checkImageUpload(input.bytes);
  if (!checked.ok) return refuse(input.bytes.length > MAX_IMAGE_BYTES ? 413 : 415, checked.message);
  let thumbnail;
  try {
    thumbnail = makeThumbnail(input.bytes, checked.type);
  } catch (error) {
    return refuse(415, error instanceof Error ? error.message : 'The image could not be decoded.');
  }
  const [{ value: existing }] = await db.select({ value: count() }).from(commentAttachments).where(eq(commentAttachments.commentId, row.id));
  if (existing >= MAX_ATTACHMENTS_PER_COMMENT) {
    return refuse(409, `A comment holds at most ${MAX_ATTACHMENTS_PER_COMMENT} images; write another comment for more.`);
  }
  const [saved] = await db
    .insert(commentAttachments)
    .values({
      commentId: row.id,
      uploaderId: input.actorId,
      fileName: cleanFileName(input.fileName),
      mime: checked.mime,
      byteSize: input.bytes.length,
      width: checked.width,
      height: checked.height,
      sha256: createHash('sha256').update(input.bytes).digest('hex'),
      content: Buffer.from(input.bytes.buffer, input.bytes.byteOffset, input.bytes.byteLength),
      thumbnail: Buffer.from(thumbnail.bytes.buffer, thumbnail.bytes.byteOffset, thumbnail.bytes.byteLength),
      thumbnailWidth: thumbnail.width,
      thumbnailHeight: thumbnail.height,
    })
    .returning(attachmentMeta);
  return { ok: true, attachment: attachmentView(saved) };
}

export interface AttachmentFile {
  fileName: string;
  mime: string;
  /** of the original image; null for a thumbnail */
  sha256: string | null;
  bytes: Buffer;
}

/** An attachment's image or its thumbnail, for members of the revision's team. */
export async function readAttachment(attachmentId: string, viewerId: string, variant: 'original' | 'thumbnail'): Promise<Outcome<{ file: AttachmentFile }>> {
  const notFound = refuse(404, 'No such attachment, or it belongs to a team you are not in.');
  if (!isId(attachmentId)) return notFound;
  const [row] = await db
    .select({
      commentId: commentAttachments.commentId,
      fileName: commentAttachments.fileName,
      mime: commentAttachments.mime,
      sha256: commentAttachments.sha256,
      bytes: variant === 'original' ? commentAttachments.content : commentAttachments.thumbnail,
    })
    .from(commentAttachments)
    .where(eq(commentAttachments.id, attachmentId));
  if (!row) return notFound;
  const found = await loadComment(row.commentId, viewerId);
  if (!found || !can({ userId: viewerId, role: found.access.role }, 'comment.view')) return notFound;
  return {
    ok: true,
    file: variant === 'original'
      ? { fileName: row.fileName, mime: row.mime, sha256: row.sha256, bytes: row.bytes }
      : { fileName: `thumbnail-${row.fileName.replace(/\.[^.]*$/, '')}.jpg`, mime: 'image/jpeg', sha256: null, bytes: row.bytes },
  };
}
