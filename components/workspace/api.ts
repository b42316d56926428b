/** Calls to the workspace's API routes; every failure becomes an ApiFailure with the server's message. */

export interface Problem {
  path: string;
  message: string;
}

export class ApiFailure extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly problems: Problem[] = [],
  ) {
    super(message);
  }
}

export async function callApi<T>(url: string, init: RequestInit = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      ...init,
      headers: init.body instanceof FormData ? init.headers : { 'content-type': 'application/json', ...init.headers },
    });
  } catch {
    throw new ApiFailure(0, 'The server could not be reached. Your text is kept in this tab; try again in a moment.');
  }
  const text = await response.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!response.ok) {
    const b = (body ?? {}) as { error?: string; problems?: Problem[]; requestId?: string };
    const id = b.requestId && response.status >= 500 ? ` (request ${b.requestId})` : '';
    throw new ApiFailure(response.status, (b.error ?? `The server answered ${response.status}.`) + id, b.problems ?? []);
  }
  return body as T;
}

export const sendJson = (method: 'POST' | 'PUT' | 'PATCH', body: unknown): RequestInit => ({ method, body: JSON.stringify(body) });
