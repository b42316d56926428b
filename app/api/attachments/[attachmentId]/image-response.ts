import { readAttachment } from '@/db/queries/comments';
import { apiError } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';

/** An attachment's bytes (or its thumbnail) for a team member, shown inline, never sniffed by the browser. */
export async function attachmentResponse(attachmentId: string, variant: 'original' | 'thumbnail'): Promise<Response> {
  const user = await requireUser();
  const outcome = await readAttachment(attachmentId, user.id, variant);
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  const { file } = outcome;
  const body = new Uint8Array(file.bytes.buffer as ArrayBuffer, file.bytes.byteOffset, file.bytes.byteLength);
  return new Response(body, {
    headers: {
      'content-type': file.mime,
      'content-length': String(body.byteLength),
      'content-disposition': `inline; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      'x-content-type-options': 'nosniff',
      ...(file.sha256 ? { 'x-content-sha256': file.sha256 } : {}),
      'cache-control': 'private, max-age=3600',
    },
  });
}
