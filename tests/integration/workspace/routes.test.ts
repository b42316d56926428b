/**
 * The workspace's routes through the running app and the real database: bundle download rights and
 * checksum, save-revision checks, phase-map and photo upload validation, stale edits, fab runs.
 * Roles and who may do what come from the team's authorization table, written out here.
 */
import { createHash } from 'node:crypto';
import path from 'node:path';
import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import JSZip from 'jszip';
import { closeDb, db } from '@/db';
import { designs, fabPhotos, fabRuns, phaseMaps, revisions } from '@/db/schema';
import { exportStore } from '@/db/queries/revisions';
import { runExportJob, type Exporter } from '@/lib/jobs/export-job';
import { threadedTask } from '@/lib/jobs/threaded-task';
import { makeRevision, makeTeam, stateOf, type TestTeam } from '../review/fixtures';
import { jsonBody, request, signInHttp } from './fixtures/http';

type Role = 'owner' | 'designer' | 'reviewer' | 'fab' | 'viewer';
const ROLES: Role[] = ['owner', 'designer', 'reviewer', 'fab', 'viewer'];
const exporter: Exporter = threadedTask({ modulePath: path.join(__dirname, 'fixtures', 'exporters.ts'), exportName: 'exportRevision', budgetMs: 5000, what: 'export' });

let team: TestTeam;
const cookie = {} as Record<Role | 'outsider', string>;
let readyRevision: string;

beforeAll(async () => {
  team = await makeTeam();
  for (const role of ROLES) cookie[role] = await signInHttp(team.members[role]);
  cookie.outsider = await signInHttp(team.outsider);
  readyRevision = await makeRevision(team, { buildStatus: 'queued', source: '# ok\nwavelength 405 nm\n' });
  await runExportJob(readyRevision, exportStore, exporter);
});
afterAll(closeDb);

async function designVersion(): Promise<number> {
  const [d] = await db.select({ version: designs.version }).from(designs).where(eq(designs.id, team.designId));
  return d.version;
}

describe('GET /api/revisions/{id}/bundle', () => {
  it.each(ROLES)('lets a team %s download the zip, with its SHA-256 in the headers', async (role) => {
    const response = await request(cookie[role], `/api/revisions/${readyRevision}/bundle`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/zip');
    expect(response.headers.get('content-disposition')).toMatch(/^attachment; filename=".+-r\d+\.zip"$/);
    const body = Buffer.from(await response.arrayBuffer());
    const hex = createHash('sha256').update(body).digest('hex');
    expect(response.headers.get('x-content-sha256')).toBe(hex);
    // RFC 3230 instance digest: base64 of the same SHA-256.
    expect(response.headers.get('digest')).toBe(`sha-256=${createHash('sha256').update(body).digest('base64')}`);
    const [stored] = await db.select({ sha: revisions.bundleSha256 }).from(revisions).where(eq(revisions.id, readyRevision));
    expect(stored.sha).toBe(hex);
    // The body is a zip JSZip (a reference reader) can open.
    expect(Object.keys((await JSZip.loadAsync(body)).files)).toContain('source.zw');
  });

  it('answers 404 to someone outside the team and 401 to an anonymous caller', async () => {
    expect((await request(cookie.outsider, `/api/revisions/${readyRevision}/bundle`)).status).toBe(404);
    expect((await request(null, `/api/revisions/${readyRevision}/bundle`)).status).toBe(401);
  });

  it('answers 409 for a revision whose export has not finished', async () => {
    const building = await makeRevision(team, { buildStatus: 'running' });
    const response = await request(cookie.designer, `/api/revisions/${building}/bundle`);
    expect(response.status).toBe(409);
    expect(((await response.json()) as { error: string }).error).toMatch(/has not finished/);
  });
});

describe('POST /api/designs/{id}/revisions', () => {
  it('refuses a script with errors, naming the line, and stores nothing', async () => {
    const before = await db.select({ id: revisions.id }).from(revisions).where(eq(revisions.designId, team.designId));
    const response = await request(
      cookie.designer,
      `/api/designs/${team.designId}/revisions`,
      jsonBody('POST', { script: 'wavelength 405 nm\naperture circle(diameter: banana)\n', message: 'broken', baseVersion: await designVersion() }),
    );
    expect(response.status).toBe(422);
    const body = (await response.json()) as { problems: { path: string }[] };
    expect(body.problems.some((p) => p.path.startsWith('script:2:'))).toBe(true);
    const after = await db.select({ id: revisions.id }).from(revisions).where(eq(revisions.designId, team.designId));
    expect(after.length).toBe(before.length);
  });

  it('refuses a script over the size limit', async () => {
    const response = await request(
      cookie.designer,
      `/api/designs/${team.designId}/revisions`,
      jsonBody('POST', { script: `# ${'x'.repeat(210_000)}\n`, message: 'huge', baseVersion: await designVersion() }),
    );
    expect(response.status).toBe(400);
    expect(((await response.json()) as { problems: { message: string }[] }).problems[0].message).toMatch(/longer than/);
  });

  it.each([
    ['reviewer', 403],
    ['fab', 403],
    ['viewer', 403],
  ] as const)('refuses a save by a %s', async (role, status) => {
    const response = await request(cookie[role], `/api/designs/${team.designId}/revisions`, jsonBody('POST', { script: 'wavelength 405 nm\n', message: 'x', baseVersion: 1 }));
    expect(response.status).toBe(status);
  });
});

describe('PUT /api/designs/{id}/draft', () => {
  it('saves from the current version and refuses a stale page without overwriting', async () => {
    const loaded = await designVersion();
    const first = await request(cookie.owner, `/api/designs/${team.designId}/draft`, jsonBody('PUT', { script: 'newer text', baseVersion: loaded }));
    expect(first.status).toBe(200);
    const stale = await request(cookie.designer, `/api/designs/${team.designId}/draft`, jsonBody('PUT', { script: 'older text', baseVersion: loaded }));
    expect(stale.status).toBe(409);
    expect(((await stale.json()) as { error: string }).error).toMatch(/changed by .* after this page loaded/);
    const [d] = await db.select({ script: designs.workingScript }).from(designs).where(eq(designs.id, team.designId));
    expect(d.script).toBe('newer text');
  });
});

function phaseMapForm(fields: Record<string, string>, file: { bytes: Uint8Array | string; name: string; type: string }): FormData {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  form.set('file', new Blob([file.bytes as BlobPart], { type: file.type }), file.name);
  return form;
}

/** A 16-bit grayscale PNG written by pngjs (a reference encoder, not ours). */
function png16(width: number, height: number): Uint8Array {
  const image = new PNG({ width, height, bitDepth: 16, colorType: 0, inputColorType: 0, inputHasAlpha: false });
  const data = new Uint16Array(width * height);
  for (let i = 0; i < data.length; i++) data[i] = (i * 997) % 65536;
  (image as unknown as { data: Uint16Array }).data = data;
  return new Uint8Array(PNG.sync.write(image as never, { bitDepth: 16, colorType: 0, inputColorType: 0, inputHasAlpha: false }));
}

describe('POST /api/designs/{id}/phase-maps', () => {
  const url = () => `/api/designs/${team.designId}/phase-maps`;

  it('stores a CSV grid and a 16-bit PNG with their sizes', async () => {
    const csv = await request(cookie.designer, url(), {
      method: 'POST',
      body: phaseMapForm({ name: 'measured_wavefront', format: 'csv', pitch: '2', phaseScale: '1' }, { bytes: '0,1,2\n3,4,5\n', name: 'w.csv', type: 'text/csv' }),
    });
    expect(csv.status).toBe(201);
    const png = await request(cookie.designer, url(), {
      method: 'POST',
      body: phaseMapForm({ name: 'hologram', format: 'png16', pitch: '0.5', phaseScale: '6.283185307179586' }, { bytes: png16(8, 4), name: 'h.png', type: 'image/png' }),
    });
    expect(png.status).toBe(201);
    const rows = await db.select().from(phaseMaps).where(eq(phaseMaps.designId, team.designId));
    const byName = Object.fromEntries(rows.map((r) => [r.name, r]));
    expect([byName.measured_wavefront.columns, byName.measured_wavefront.rows]).toEqual([3, 2]);
    expect([byName.hologram.columns, byName.hologram.rows]).toEqual([8, 4]);
  });

  it.each([
    ['an 8-bit PNG', { name: 'eight_bit', format: 'png16', pitch: '1', phaseScale: '6.28' }, (): Uint8Array | string => new Uint8Array(PNG.sync.write(Object.assign(new PNG({ width: 2, height: 2 }), { data: Buffer.alloc(16, 128) }))), 400, /grayscale|16-bit/],
    ['CSV text sent as PNG', { name: 'not_png', format: 'png16', pitch: '1', phaseScale: '6.28' }, (): Uint8Array | string => '1,2\n3,4\n', 400, /not a PNG/],
    ['ragged CSV rows', { name: 'ragged', format: 'csv', pitch: '1', phaseScale: '1' }, (): Uint8Array | string => '1,2,3\n4,5\n', 400, /same count/],
    ['a bad name', { name: '9lives', format: 'csv', pitch: '1', phaseScale: '1' }, (): Uint8Array | string => '1\n', 400, /problems/],
    ['a zero pitch', { name: 'flat', format: 'csv', pitch: '0', phaseScale: '1' }, (): Uint8Array | string => '1\n', 400, /problems/],
    ['a name already used', { name: 'hologram', format: 'csv', pitch: '1', phaseScale: '1' }, (): Uint8Array | string => '1,2\n3,4\n', 409, /already has a phase map/],
  ] as const)('refuses %s with a clear message', async (_what, fields, bytes, status, message) => {
    const response = await request(cookie.designer, url(), { method: 'POST', body: phaseMapForm(fields, { bytes: bytes(), name: 'upload', type: 'application/octet-stream' }) });
    expect(response.status).toBe(status);
    expect(((await response.json()) as { error: string }).error).toMatch(message);
  });

  it('refuses a file over 8 MB before parsing it', async () => {
    const big = new Uint8Array(8 * 1024 * 1024 + 10);
    const response = await request(cookie.designer, url(), { method: 'POST', body: phaseMapForm({ name: 'big', format: 'csv', pitch: '1', phaseScale: '1' }, { bytes: big, name: 'big.csv', type: 'text/csv' }) });
    expect(response.status).toBe(413);
  });

  it('refuses an upload by a viewer', async () => {
    const response = await request(cookie.viewer, url(), { method: 'POST', body: phaseMapForm({ name: 'v', format: 'csv', pitch: '1', phaseScale: '1' }, { bytes: '1\n', name: 'v.csv', type: 'text/csv' }) });
    expect(response.status).toBe(403);
  });
});

function runForm(revisionId: string, photos: { bytes: Uint8Array | string; name: string }[]): FormData {
  const form = new FormData();
  const fields = { revisionId, runDate: '2026-12-01', tool: 'mask aligner', dose: '110', doseUnit: 'mJ/cm²', focus: '0', resist: 'positive resist', resistThickness: '0.8', notes: 'first lot' };
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  for (const p of photos) form.append('photo', new Blob([p.bytes as BlobPart], { type: 'image/png' }), p.name);
  return form;
}

function rgbPng(): Uint8Array {
  const image = new PNG({ width: 40, height: 30 });
  image.data.fill(200);
  return new Uint8Array(PNG.sync.write(image));
}

describe('POST /api/fab/runs', () => {
  it('refuses a photo that is not an image by its bytes, storing neither run nor photos', async () => {
    const released = await makeRevision(team, { state: 'released' });
    const response = await request(cookie.fab, '/api/fab/runs', { method: 'POST', body: runForm(released, [{ bytes: 'GIF89a not really', name: 'photo.png' }]) });
    expect(response.status).toBe(400);
    expect(await db.select().from(fabRuns).where(eq(fabRuns.revisionId, released))).toHaveLength(0);
    expect(await stateOf(released)).toBe('released');
  });

  it('records a run by fab staff with a photo and moves the revision to fabricated', async () => {
    const released = await makeRevision(team, { state: 'released' });
    const response = await request(cookie.fab, '/api/fab/runs', { method: 'POST', body: runForm(released, [{ bytes: rgbPng(), name: 'inspection.png' }]) });
    expect(response.status).toBe(201);
    expect(await stateOf(released)).toBe('fabricated');
    const [run] = await db.select().from(fabRuns).where(eq(fabRuns.revisionId, released));
    expect(run).toMatchObject({ tool: 'mask aligner', dose: 110, doseUnit: 'mJ/cm²', resistThickness: 0.8 });
    const photos = await db.select().from(fabPhotos).where(eq(fabPhotos.fabRunId, run.id));
    expect(photos).toHaveLength(1);
    expect(photos[0]).toMatchObject({ mimeType: 'image/png', width: 40, height: 30 });
    const thumb = await request(cookie.viewer, `/api/fab/photos/${photos[0].id}?size=thumbnail`);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('content-type')).toBe('image/jpeg');
    expect((await request(cookie.outsider, `/api/fab/photos/${photos[0].id}`)).status).toBe(404);
  });

  it.each(['designer', 'reviewer', 'viewer'] as const)('refuses a run recorded by a %s', async (role) => {
    const released = await makeRevision(team, { state: 'released' });
    const response = await request(cookie[role], '/api/fab/runs', { method: 'POST', body: runForm(released, []) });
    expect(response.status).toBe(403);
    expect(await stateOf(released)).toBe('released');
  });

  it('refuses a run for a revision not released to fab', async () => {
    const approved = await makeRevision(team, { state: 'approved' });
    const response = await request(cookie.fab, '/api/fab/runs', { method: 'POST', body: runForm(approved, []) });
    expect(response.status).toBe(409);
    expect(await stateOf(approved)).toBe('approved');
  });
});
