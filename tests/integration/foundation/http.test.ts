/** The route wrapper's handling of unexpected errors: logged with the request id, answered without internals. */
import { NextRequest } from 'next/server';
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ApiError, handle, parseBody } from '@/app/_server/http';

const context = { params: Promise.resolve({}) };

describe('handle', () => {
  it('answers 500 with a request id and no internals, and logs the error with that id', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const route = handle(async () => {
      throw new Error('duplicate key value violates unique constraint "users_email_unique"');
    });
    const response = await route(new NextRequest('http://127.0.0.1/api/x', { method: 'POST' }), context);
    const body = await response.json();
    expect(response.status).toBe(500);
    expect(body.requestId).toBe(response.headers.get('x-request-id'));
    expect(JSON.stringify(body)).not.toContain('unique constraint');
    expect(log.mock.calls.some((call) => call.join(' ').includes(body.requestId))).toBe(true);
    log.mockRestore();
  });

  it('passes ApiError status, message and problems through', async () => {
    const route = handle(async (request) => {
      await parseBody(request, z.object({ size: z.number().positive('The size must be more than 0 µm.') }));
      throw new ApiError(418, 'unreachable');
    });
    const response = await route(new NextRequest('http://127.0.0.1/api/x', { method: 'POST', body: '{"size": -1}' }), context);
    expect(response.status).toBe(400);
    expect((await response.json()).problems).toEqual([{ path: 'size', message: 'The size must be more than 0 µm.' }]);
  });
});
