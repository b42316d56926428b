/** Comments, mentions and attachments against the real PostgreSQL and the local SMTP fake. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import jpeg from 'jpeg-js';
import { closeDb } from '@/db';
import { addAttachment, createComment, deleteComment, editComment, listComments, readAttachment } from '@/db/queries/comments';
import { APP_URL, mailTo, makeRevision, makeTeam, setPreference, type TestTeam } from './fixtures';

let team: TestTeam;
let revisionId: string;
const handle = (email: string) => email.split('@')[0];

beforeAll(async () => {
  team = await makeTeam();
  revisionId = await makeRevision(team, { state: 'in_review', source: 'wavelength 405 nm\nfocus 0 0 5 mm\nfocus 0 0 8 mm\n' });
});
afterAll(closeDb);

function pngBytes(width: number, height: number): Uint8Array {
  const png = new PNG({ width, height });
  png.data.fill(200);
  return new Uint8Array(PNG.sync.write(png));
}

async function comment(role: keyof TestTeam['members'], body: string, extra: { parentId?: string; anchor?: { line: number } | { x_um: number; y_um: number } } = {}) {
  const outcome = await createComment({ revisionId, actorId: team.members[role].id, body, appUrl: APP_URL, ...extra });
  if (!outcome.ok) throw new Error(outcome.message);
  return outcome.comment;
}

describe('who may comment', () => {
  it('owner, designer, reviewer and fab may write; viewers may only read; non-members see nothing', async () => {
    for (const role of ['owner', 'designer', 'reviewer', 'fab'] as const) {
      expect(await createComment({ revisionId, actorId: team.members[role].id, body: `note from ${role}`, appUrl: APP_URL })).toMatchObject({ ok: true });
    }
    expect(await createComment({ revisionId, actorId: team.members.viewer.id, body: 'hi', appUrl: APP_URL })).toMatchObject({ ok: false, status: 403 });
    expect(await createComment({ revisionId, actorId: team.outsider.id, body: 'hi', appUrl: APP_URL })).toMatchObject({ ok: false, status: 404 });
    const seen = await listComments(revisionId, team.members.viewer.id);
    expect(seen.ok && seen.comments.map((c) => c.body)).toEqual(expect.arrayContaining(['note from owner', 'note from fab']));
    expect(await listComments(revisionId, team.outsider.id)).toMatchObject({ ok: false, status: 404 });
  });

  it('only the author edits; the author or an owner deletes', async () => {
    const c = await comment('designer', 'first draft of a note');
    expect(await editComment({ commentId: c.id, actorId: team.members.owner.id, body: 'x', appUrl: APP_URL })).toMatchObject({ ok: false, status: 403 });
    const edited = await editComment({ commentId: c.id, actorId: team.members.designer.id, body: 'second draft', expectedEditedAt: null, appUrl: APP_URL });
    expect(edited).toMatchObject({ ok: true, comment: { body: 'second draft' } });
    expect(await deleteComment(c.id, team.members.reviewer.id)).toMatchObject({ ok: false, status: 403 });
    expect(await deleteComment(c.id, team.members.owner.id)).toMatchObject({ ok: true, comment: { body: '', canEdit: false } });
    const own = await comment('fab', 'mine');
    expect(await deleteComment(own.id, team.members.fab.id)).toMatchObject({ ok: true });
  });

  it('a stale edit (edited elsewhere since the page loaded) is refused and keeps the newer text', async () => {
    const c = await comment('reviewer', 'v1');
    const first = await editComment({ commentId: c.id, actorId: team.members.reviewer.id, body: 'v2', expectedEditedAt: null, appUrl: APP_URL });
    expect(first.ok).toBe(true);
    const stale = await editComment({ commentId: c.id, actorId: team.members.reviewer.id, body: 'v2 from an old tab', expectedEditedAt: null, appUrl: APP_URL });
    expect(stale).toMatchObject({ ok: false, status: 409 });
    const list = await listComments(revisionId, team.members.reviewer.id);
    expect(list.ok && list.comments.find((x) => x.id === c.id)?.body).toBe('v2');
  });
});

describe('threads and anchors', () => {
  it('keeps replies in place when their parent is deleted', async () => {
    const root = await comment('reviewer', 'Is line 3 the 8 mm focus?', { anchor: { line: 3 } });
    const reply = await comment('designer', 'Yes.', { parentId: root.id });
    expect(reply.parentId).toBe(root.id);
    await deleteComment(root.id, team.members.reviewer.id);
    const list = await listComments(revisionId, team.members.designer.id);
    if (!list.ok) throw new Error(list.message);
    expect(list.comments.find((c) => c.id === root.id)).toMatchObject({ body: '', anchor: { line: 3 }, deletedAt: expect.any(String) });
    expect(list.comments.find((c) => c.id === reply.id)).toMatchObject({ body: 'Yes.', parentId: root.id });
    expect(await createComment({ revisionId, actorId: team.members.fab.id, body: 'late', parentId: root.id, appUrl: APP_URL })).toMatchObject({ ok: false, status: 409 });
  });

  it('refuses a line past the end of the script and a parent on another revision', async () => {
    const tooFar = await createComment({ revisionId, actorId: team.members.reviewer.id, body: 'x', anchor: { line: 99 }, appUrl: APP_URL });
    expect(tooFar).toMatchObject({ ok: false, status: 400, message: "Line 99 is past the end of this revision's script, which has 4 lines." });
    const other = await makeRevision(team);
    const foreign = await createComment({ revisionId: other, actorId: team.members.reviewer.id, body: 'x', appUrl: APP_URL });
    if (!foreign.ok) throw new Error(foreign.message);
    expect(await createComment({ revisionId, actorId: team.members.reviewer.id, body: 'x', parentId: foreign.comment.id, appUrl: APP_URL })).toMatchObject({ ok: false, status: 400 });
  });

  it('stores a mask-point anchor in µm', async () => {
    const c = await comment('fab', 'Bridging here after development', { anchor: { x_um: -125.5, y_um: 40.25 } });
    expect(c.anchor).toEqual({ x_um: -125.5, y_um: 40.25 });
  });
});

describe('mentions', () => {
  it('e-mails each mentioned member once with a link to the comment, honouring their switch', async () => {
    const c = await comment('designer', `@${handle(team.members.reviewer.email)} and @${handle(team.members.fab.email)}: see the outer zones. @nobody`);
    const mail = (await mailTo(team.members.reviewer.email)).find((m) => m.text.includes(`#comment-${c.id}`));
    expect(mail?.subject).toMatch(/mentioned you on revision/);
    expect(mail?.html).toContain(`/revisions/${revisionId}#comment-${c.id}`);

    await setPreference(team.members.viewer.id, { notifyMention: false });
    const quiet = await createComment({ revisionId, actorId: team.members.designer.id, body: `@${handle(team.members.viewer.email)} fyi`, appUrl: APP_URL });
    expect(quiet).toMatchObject({ ok: true, mentioned: [] });
    await setPreference(team.members.viewer.id, { notifyMention: true });

    const self = await createComment({ revisionId, actorId: team.members.designer.id, body: `note to @${handle(team.members.designer.email)}`, appUrl: APP_URL });
    expect(self).toMatchObject({ ok: true, mentioned: [] });
  });

  it('an edit e-mails only the newly mentioned', async () => {
    const c = await comment('reviewer', `@${handle(team.members.designer.email)} please look`);
    const edited = await editComment({
      commentId: c.id,
      actorId: team.members.reviewer.id,
      body: `@${handle(team.members.designer.email)} please look, and @${handle(team.members.owner.email)} too`,
      appUrl: APP_URL,
    });
    expect(edited).toMatchObject({ ok: true, mentioned: [team.members.owner.email] });
    expect((await mailTo(team.members.designer.email)).filter((m) => m.text.includes(`#comment-${c.id}`))).toHaveLength(1);
  });
});

describe('attachments', () => {
  it('accepts PNG and JPEG by content, with thumbnails, readable by every member', async () => {
    const c = await comment('fab', 'Inspection photos of the first exposure');
    const png = await addAttachment({ commentId: c.id, actorId: team.members.fab.id, fileName: 'C:\\scope\\zone-edge.png', bytes: pngBytes(1200, 800) });
    expect(png).toMatchObject({ ok: true, attachment: { fileName: 'zone-edge.png', mime: 'image/png', width: 1200, height: 800, thumbnailWidth: 320, thumbnailHeight: 213 } });
    const data = new Uint8Array(640 * 480 * 4).fill(90);
    // a JPEG named .png: the type comes from the content
    const jpg = await addAttachment({ commentId: c.id, actorId: team.members.fab.id, fileName: 'photo.png', bytes: new Uint8Array(jpeg.encode({ width: 640, height: 480, data }, 85).data) });
    expect(jpg).toMatchObject({ ok: true, attachment: { mime: 'image/jpeg', width: 640, height: 480 } });

    if (!png.ok) throw new Error(png.message);
    const original = await readAttachment(png.attachment.id, team.members.viewer.id, 'original');
    expect(original.ok && [...original.file.bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    const thumb = await readAttachment(png.attachment.id, team.members.viewer.id, 'thumbnail');
    expect(thumb.ok && thumb.file.mime).toBe('image/jpeg');
    expect(thumb.ok && jpeg.decode(thumb.file.bytes).width).toBe(320);
    expect(await readAttachment(png.attachment.id, team.outsider.id, 'original')).toMatchObject({ ok: false, status: 404 });
  });

  it('refuses other types, oversize files and images on someone else\'s comment', async () => {
    const c = await comment('fab', 'more photos');
    const gif = new TextEncoder().encode('GIF89a\u0001\u0000\u0001\u0000\u0000\u0000\u0000');
    expect(await addAttachment({ commentId: c.id, actorId: team.members.fab.id, fileName: 'scope.png', bytes: gif })).toMatchObject({ ok: false, status: 415, message: expect.stringMatching(/Only PNG and JPEG/) });
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set(pngBytes(4, 4));
    expect(await addAttachment({ commentId: c.id, actorId: team.members.fab.id, fileName: 'big.png', bytes: big })).toMatchObject({ ok: false, status: 413 });
    expect(await addAttachment({ commentId: c.id, actorId: team.members.owner.id, fileName: 'a.png', bytes: pngBytes(4, 4) })).toMatchObject({ ok: false, status: 403 });
    const list = await listComments(revisionId, team.members.fab.id);
    expect(list.ok && list.comments.find((x) => x.id === c.id)?.attachments).toEqual([]);
  });
});
