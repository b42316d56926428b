/** JSON calls to our API routes from the browser; a refusal becomes an error carrying the server's message. */

export class ApiFailure extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly requestId?: string,
  ) {
    super(message);
  }
}

export async function apiJson<T>(url: string, init: RequestInit = {}): Promise<T> {
  const isJsonBody = typeof init.body === 'string';
  let response: Response;
  try {
    response = await fetch(url, {
      ...init,
      headers: { accept: 'application/json', ...(isJsonBody ? { 'content-type': 'application/json' } : {}), ...init.headers },
    });
  } catch {
    throw new ApiFailure(0, 'The server could not be reached. Check your connection; nothing was changed.');
  }
  const text = await response.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = null;
  }
  if (!response.ok) {
    const body = (data ?? {}) as { error?: string; requestId?: string; problems?: { path: string; message: string }[] };
    const details = body.problems?.map((p) => (p.path ? `${p.path}: ${p.message}` : p.message)).join('; ');
    const message = body.error ? (details ? `${body.error} ${details}` : body.error) : `The server answered ${response.status}.`;
    throw new ApiFailure(response.status, message, body.requestId);
  }
  return data as T;
}

export function errorText(error: unknown): string {
  return error instanceof Error ? error.message : 'Something went wrong.';
}
