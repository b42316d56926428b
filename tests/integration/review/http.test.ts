/**
 * The review routes over HTTP against the running app: status codes and error shapes
 * (401 anonymous, 400 with problems, 403, 404, 409, 413/415), as a browser would meet them.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import JSZip from 'jszip';
import { writeGdsii } from '@/lib/gdsii';
import type { LayoutLibrary } from '@/lib/layout/types';
import { closeDb } from '@/db';
import { TEST_PASSWORD, makeRevision, makeTeam, stateOf, type TestTeam } from './fixtures';
import { anonymousFetch, signedInFetch, type Fetcher } from './http-session';

let team: TestTeam;
let as: Record<'designer' | 'reviewer' | 'viewer' | 'fab' | 'outsider', Fetcher>;

beforeAll(async () => {
  team = await makeTeam();
  as = {
    designer: await signedInFetch(team.members.designer.email, TEST_PASSWORD),
    reviewer: await signedInFetch(team.members.reviewer.email, TEST_PASSWORD),
    viewer: await signedInFetch(team.members.viewer.email, TEST_PASSWORD),
    fab: await signedInFetch(team.members.fab.email, TEST_PASSWORD),
    outsider: await signedInFetch(team.outsider.email, TEST_PASSWORD),
  };
});
afterAll(closeDb);

const postJson = (body: unknown): RequestInit => ({ method: 'POST', headers: { 'content-type': 'application/json' }, body: typeof body === 'string' ? body : JSON.stringify(body) });

describe('moves over HTTP', () => {
  it('401 for anonymous callers, 400 with problems for bad bodies, 404 for junk ids', async () => {
    const revisionId = await makeRevision(team);
    const anonymous = await anonymousFetch(`/api/revisions/${revisionId}/moves`, postJson({ move: 'requestReview', expectedState: 'draft' }));
    expect(anonymous.status).toBe(401);
    expect(await anonymous.json()).toMatchObject({ error: expect.any(String), requestId: expect.any(String) });

    const malformed = await as.designer(`/api/revisions/${revisionId}/moves`, postJson('{"move": '));
    expect(malformed.status).toBe(400);
    expect(await malformed.json()).toMatchObject({ error: 'The request body is not valid JSON.' });

    const unknown = await as.designer(`/api/revisions/${revisionId}/moves`, postJson({ move: 'ship', expectedState: 'draft' }));
    expect(unknown.status).toBe(400);
    expect((await unknown.json()).problems).toEqual([expect.objectContaining({ path: 'move' })]);

    expect((await as.designer('/api/revisions/not-a-uuid/moves', postJson({ move: 'requestReview', expectedState: 'draft' }))).status).toBe(404);
    expect((await as.outsider(`/api/revisions/${revisionId}/moves`)).status).toBe(404);
    expect(await stateOf(revisionId)).toBe('draft');
  });

  it('offers each role its moves, applies an allowed one and answers a stale page with 409', async () => {
    const revisionId = await makeRevision(team);
    const designerChoices = await (await as.designer(`/api/revisions/${revisionId}/moves`)).json();
    expect(designerChoices).toEqual({ state: 'draft', stateLabel: 'draft', moves: [{ move: 'requestReview', label: 'Request review' }], ownRevision: false, bundlePending: false });
    const building = await makeRevision(team, { buildStatus: 'running' });
    expect(await (await as.designer(`/api/revisions/${building}/moves`)).json()).toMatchObject({ moves: [], bundlePending: true });
    expect((await (await as.viewer(`/api/revisions/${revisionId}/moves`)).json()).moves).toEqual([]);

    const forbidden = await as.viewer(`/api/revisions/${revisionId}/moves`, postJson({ move: 'requestReview', expectedState: 'draft' }));
    expect(forbidden.status).toBe(403);

    const done = await as.designer(`/api/revisions/${revisionId}/moves`, postJson({ move: 'requestReview', expectedState: 'draft' }));
    expect(done.status).toBe(200);
    expect(await done.json()).toMatchObject({ state: 'in_review', stateLabel: 'in review', emailed: expect.arrayContaining([team.members.reviewer.email]) });

    const stale = await as.designer(`/api/revisions/${revisionId}/moves`, postJson({ move: 'requestReview', expectedState: 'draft' }));
    expect(stale.status).toBe(409);
    expect((await stale.json()).error).toMatch(/changed since the page was loaded/);
  });
});

describe('comments and attachments over HTTP', () => {
  function pngBytes(): Uint8Array<ArrayBuffer> {
    const png = new PNG({ width: 400, height: 300 });
    png.data.fill(120);
    return Uint8Array.from(PNG.sync.write(png));
  }

  it('creates, lists, edits and refuses by role', async () => {
    const revisionId = await makeRevision(team);
    const created = await as.reviewer(`/api/revisions/${revisionId}/comments`, postJson({ body: 'Zone 3 looks thin', anchor: { line: 2 } }));
    expect(created.status).toBe(201);
    const { comment } = await created.json();
    expect(comment).toMatchObject({ body: 'Zone 3 looks thin', anchor: { line: 2 }, canEdit: true });

    expect((await as.viewer(`/api/revisions/${revisionId}/comments`, postJson({ body: 'hi' }))).status).toBe(403);
    const listed = await (await as.viewer(`/api/revisions/${revisionId}/comments`)).json();
    expect(listed.comments).toEqual([expect.objectContaining({ id: comment.id, canEdit: false, canDelete: false })]);

    const notMine = await as.designer(`/api/comments/${comment.id}`, { method: 'PATCH', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ body: 'x' }) });
    expect(notMine.status).toBe(403);
    const bad = await as.reviewer(`/api/revisions/${revisionId}/comments`, postJson({ body: 'x', anchor: { x_um: 'left', y_um: 0 } }));
    expect(bad.status).toBe(400);
    expect((await bad.json()).problems.length).toBeGreaterThan(0);
  });

  it('takes a PNG, serves it and its thumbnail to members only, and refuses other types', async () => {
    const revisionId = await makeRevision(team);
    const { comment } = await (await as.fab(`/api/revisions/${revisionId}/comments`, postJson({ body: 'after development' }))).json();

    const wrong = new FormData();
    wrong.append('file', new Blob([new TextEncoder().encode('%PDF-1.7 not an image')]), 'scope.png');
    const refused = await as.fab(`/api/comments/${comment.id}/attachments`, { method: 'POST', body: wrong });
    expect(refused.status).toBe(415);
    expect((await refused.json()).error).toMatch(/Only PNG and JPEG/);

    const form = new FormData();
    form.append('file', new Blob([pngBytes()], { type: 'application/octet-stream' }), 'edge.png');
    const uploaded = await as.fab(`/api/comments/${comment.id}/attachments`, { method: 'POST', body: form });
    expect(uploaded.status).toBe(201);
    const { attachment } = await uploaded.json();
    expect(attachment).toMatchObject({ mime: 'image/png', width: 400, height: 300 });

    const original = await as.viewer(attachment.url);
    expect(original.headers.get('content-type')).toBe('image/png');
    expect(original.headers.get('x-content-type-options')).toBe('nosniff');
    const thumb = await as.viewer(attachment.thumbnailUrl);
    expect(thumb.headers.get('content-type')).toBe('image/jpeg');
    expect([...new Uint8Array(await thumb.arrayBuffer()).subarray(0, 2)]).toEqual([0xff, 0xd8]);
    expect((await as.outsider(attachment.url)).status).toBe(404);
    expect((await anonymousFetch(attachment.url)).status).toBe(401);
  });
});

describe('compare over HTTP', () => {
  // Hand geometry on a 1 nm grid: a 10 × 5 µm rectangle moved 2 µm along x gains and loses 10 µm².
  async function bundleWith(x0: number): Promise<Uint8Array> {
    const library: LayoutLibrary = {
      name: 'T',
      databaseUnit: 1e-9,
      userUnit: 1e-6,
      layers: [],
      cells: [{ name: 'TOP', shapes: [{ layer: 1, datatype: 0, polygons: [Int32Array.from([x0, 0, x0 + 10, 0, x0 + 10, 5, x0, 5].map((v) => v * 1000))] }], texts: [], placements: [] }],
      topCell: 'TOP',
    };
    const zip = new JSZip();
    zip.file('manifest.json', JSON.stringify({ layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }] }));
    zip.file('mask.gds', writeGdsii(library));
    return zip.generateAsync({ type: 'uint8array' });
  }

  it('gives the per-layer XOR of the stored bundles to members, and a clear 409 without a bundle', async () => {
    const a = await makeRevision(team, { bundle: await bundleWith(0) });
    const b = await makeRevision(team, { bundle: await bundleWith(2) });
    const response = await as.reviewer(`/api/compare?a=${a}&b=${b}`);
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.layers).toEqual([expect.objectContaining({ layer: 1, datatype: 0, name: 'zones (1/0)', addedArea: 10, removedArea: 10 })]);
    expect((await as.outsider(`/api/compare?a=${a}&b=${b}`)).status).toBe(404);
    const pending = await makeRevision(team, { buildStatus: 'running' });
    const refused = await as.reviewer(`/api/compare?a=${a}&b=${pending}`);
    expect(refused.status).toBe(409);
    expect((await refused.json()).error).toMatch(/has no bundle to compare yet \(its export is running\)/);
  });

  it('refuses a query without two different revision ids', async () => {
    const revisionId = await makeRevision(team);
    const same = await as.reviewer(`/api/compare?a=${revisionId}&b=${revisionId}`);
    expect(same.status).toBe(400);
    expect((await same.json()).problems).toEqual([{ path: 'b', message: 'Pick two different revisions to compare.' }]);
    expect((await as.reviewer('/api/compare?a=1')).status).toBe(400);
  });
});
