/**
 * The API's error shapes, over HTTP against the running app: 401 signed out, 403 without the role,
 * 400 with the list of problems, 404 for unknown ids; every error is JSON with a request id.
 */
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, demoTeamId, signInCookie, type ApiResponse } from './helpers';

let teamId: string;
let owner: string;
let designer: string;
let viewer: string;

beforeAll(async () => {
  teamId = await demoTeamId();
  [owner, designer, viewer] = await Promise.all(['owner', 'designer', 'viewer'].map((r) => signInCookie(`${r}@example.com`)));
});

function expectErrorShape(response: ApiResponse, status: number) {
  expect(response.status).toBe(status);
  expect(response.headers.get('content-type')).toContain('application/json');
  expect(typeof response.body?.error).toBe('string');
  expect(response.body.error.length).toBeGreaterThan(0);
  expect(response.body.requestId).toBe(response.headers.get('x-request-id'));
  // No stack frames or database error text ever reach the caller.
  expect(response.text).not.toMatch(/\bat .+\(.+:\d+:\d+\)|node_modules|relation "|syntax error at/);
}

describe('POST /api/designs', () => {
  it('answers 401 JSON to an anonymous caller', async () => {
    const response = await api('/api/designs', { method: 'POST', body: { teamId, name: 'Anonymous lens' } });
    expectErrorShape(response, 401);
  });

  it('answers 403 JSON to a viewer', async () => {
    const response = await api('/api/designs', { method: 'POST', cookie: viewer, body: { teamId, name: 'Viewer lens' } });
    expectErrorShape(response, 403);
    expect(response.body.error).toMatch(/viewer/);
  });

  it('answers 400 with the parser problem for malformed JSON', async () => {
    const response = await api('/api/designs', { method: 'POST', cookie: designer, body: '{"name": "half' });
    expectErrorShape(response, 400);
    expect(response.body.problems).toHaveLength(1);
    expect(response.body.problems[0].path).toBe('');
  });

  it('answers 400 for an empty body', async () => {
    const response = await api('/api/designs', { method: 'POST', cookie: designer, body: '' });
    expectErrorShape(response, 400);
    expect(response.body.problems[0].message).toMatch(/empty/);
  });

  it('answers 400 listing every field that fails validation', async () => {
    const response = await api('/api/designs', { method: 'POST', cookie: designer, body: { teamId: 'not-a-uuid', name: '', description: 7 } });
    expectErrorShape(response, 400);
    const paths = response.body.problems.map((p: { path: string }) => p.path).sort();
    expect(paths).toEqual(['description', 'name', 'teamId']);
  });

  it('answers 404 for a team that does not exist', async () => {
    const response = await api('/api/designs', { method: 'POST', cookie: owner, body: { teamId: randomUUID(), name: 'Lost lens' } });
    expectErrorShape(response, 404);
  });

  it('creates the design for a designer (201) and lists it', async () => {
    const name = `Test zone plate ${Date.now()}`;
    const created = await api('/api/designs', { method: 'POST', cookie: designer, body: { teamId, name, description: 'integration test' } });
    expect(created.status).toBe(201);
    expect(created.body.design).toMatchObject({ name, teamId, description: 'integration test' });
    const listed = await api(`/api/designs?teamId=${teamId}`, { cookie: viewer });
    expect(listed.status).toBe(200);
    expect(listed.body.designs.map((d: { name: string }) => d.name)).toContain(name);
  });
});

describe('GET /api/designs', () => {
  it('answers 401 signed out', async () => {
    expectErrorShape(await api('/api/designs'), 401);
  });

  it('answers 400 for a malformed teamId', async () => {
    const response = await api('/api/designs?teamId=42', { cookie: viewer });
    expectErrorShape(response, 400);
    expect(response.body.problems[0].path).toBe('teamId');
  });

  it('answers 404 for an unknown team', async () => {
    expectErrorShape(await api(`/api/designs?teamId=${randomUUID()}`, { cookie: viewer }), 404);
  });

  it('uses the current team when teamId is left out', async () => {
    const response = await api('/api/designs', { cookie: viewer });
    expect(response.status).toBe(200);
    expect(response.body.teamId).toBe(teamId);
  });
});

describe('team routes', () => {
  it('answer 404 for an unknown member or invitation id', async () => {
    expectErrorShape(await api(`/api/team/members/${randomUUID()}`, { method: 'PATCH', cookie: owner, body: { teamId, role: 'viewer' } }), 404);
    expectErrorShape(await api(`/api/team/invitations/${randomUUID()}?teamId=${teamId}`, { method: 'DELETE', cookie: owner }), 404);
    expectErrorShape(await api(`/api/team/members/not-an-id`, { method: 'PATCH', cookie: owner, body: { teamId, role: 'viewer' } }), 404);
  });

  it('answer 400 for an unknown role', async () => {
    const response = await api('/api/team/invitations', { method: 'POST', cookie: owner, body: { teamId, email: 'x@example.com', role: 'admin' } });
    expectErrorShape(response, 400);
    expect(response.body.problems.map((p: { path: string }) => p.path)).toEqual(['role']);
  });

  it('answer 404 for a used or made-up invitation token', async () => {
    expectErrorShape(await api('/api/team/invitations/accept', { method: 'POST', body: { token: 'x'.repeat(43) } }), 404);
  });
});
