/**
 * JSON responses and errors for route handlers. Every response carries an x-request-id; a server error
 * is logged with it and answered without internals, so a user can quote the id and we can find the log.
 *
 * Error body: { error: string, requestId: string, problems?: { path: string, message: string }[] }
 */
import { randomUUID } from 'node:crypto';
import type { NextRequest } from 'next/server';
import type { z } from 'zod';

export interface Problem {
  /** Dotted path into the body or query ('' for the whole thing). */
  path: string;
  message: string;
}

/** Throw from anywhere in a handler; `handle` turns it into the JSON error response. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly problems?: Problem[],
  ) {
    super(message);
  }
}

export function apiError(status: number, message: string, problems?: Problem[]): ApiError {
  return new ApiError(status, message, problems);
}

export function json(body: unknown, init: { status?: number; requestId?: string } = {}): Response {
  const headers: Record<string, string> = { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' };
  if (init.requestId) headers['x-request-id'] = init.requestId;
  return new Response(JSON.stringify(body), { status: init.status ?? 200, headers });
}

function errorResponse(error: ApiError, requestId: string): Response {
  return json({ error: error.message, requestId, ...(error.problems ? { problems: error.problems } : {}) }, { status: error.status, requestId });
}

export interface HandlerContext<P> {
  params: P;
  requestId: string;
}

/** Wrap a route handler: awaits params, gives a request id, maps thrown errors to JSON. */
export function handle<P = Record<string, never>>(
  fn: (request: NextRequest, context: HandlerContext<P>) => Promise<Response>,
): (request: NextRequest, context: { params: Promise<P> }) => Promise<Response> {
  return async (request, context) => {
    // A caller's own id is kept (to follow a request across services) only when it is a plain token.
    const given = request.headers.get('x-request-id');
    const requestId = given && /^[A-Za-z0-9_-]{8,64}$/.test(given) ? given : randomUUID();
    try {
      const response = await fn(request, { params: await context.params, requestId });
      if (!response.headers.has('x-request-id')) response.headers.set('x-request-id', requestId);
      return response;
    } catch (error) {
      if (error instanceof ApiError) return errorResponse(error, requestId);
      console.error(`[api] ${request.method} ${request.nextUrl.pathname} failed, request ${requestId}:`, error);
      return errorResponse(new ApiError(500, 'Something went wrong on our side. Quote this request id if you report it.'), requestId);
    }
  };
}

export function problemsOf(error: z.ZodError): Problem[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }));
}

/** Read and validate a JSON body; 400 with the list of problems when it is malformed or invalid. */
export async function parseBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  const text = await request.text();
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    const reason = text.trim() === '' ? 'the body is empty' : error instanceof Error ? error.message : 'unreadable';
    throw new ApiError(400, 'The request body is not valid JSON.', [{ path: '', message: reason }]);
  }
  const result = schema.safeParse(value);
  if (!result.success) throw new ApiError(400, 'The request body has problems.', problemsOf(result.error));
  return result.data;
}

/** Validate the query string (as a flat object of strings); 400 with the list of problems. */
export function parseQuery<S extends z.ZodType>(request: NextRequest, schema: S): z.infer<S> {
  const result = schema.safeParse(Object.fromEntries(request.nextUrl.searchParams));
  if (!result.success) throw new ApiError(400, 'The query has problems.', problemsOf(result.error));
  return result.data;
}
