/** Call one of our JSON routes; returns the parsed body or throws an Error with the server's message. */
export async function callApi<T = unknown>(url: string, init: { method: string; body?: unknown }): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      method: init.method,
      headers: init.body === undefined ? undefined : { 'content-type': 'application/json' },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
  } catch {
    throw new Error('The server could not be reached. Nothing changed; try again.');
  }
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    const problems: { message: string }[] = Array.isArray(body?.problems) ? body.problems : [];
    const detail = problems.map((p) => p.message).join(' ');
    throw new Error([body?.error ?? `The request failed (HTTP ${response.status}).`, detail].filter(Boolean).join(' '));
  }
  return body as T;
}
