import { getPhoto } from '@/db/queries/fab';
import { ApiError, handle } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { can } from '@/lib/auth';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** An inspection photo (?size=thumbnail for its preview); team members only. */
export const GET = handle<{ photoId: string }>(async (request, { params }) => {
  const user = await requireUser();
  const size = request.nextUrl.searchParams.get('size') === 'thumbnail' ? 'thumbnail' : 'full';
  const photo = UUID.test(params.photoId) ? await getPhoto(params.photoId, user.id, size) : null;
  if (!photo || !can({ userId: user.id, role: photo.role }, 'revision.view')) throw new ApiError(404, 'No such photo.');
  const body = new Uint8Array(photo.bytes.buffer as ArrayBuffer, photo.bytes.byteOffset, photo.bytes.byteLength);
  return new Response(body, {
    headers: {
      'content-type': photo.mimeType,
      'content-length': String(body.byteLength),
      'content-disposition': `inline; filename="${photo.fileName.replace(/[^\w.\- ]+/g, '_')}"`,
      'x-content-type-options': 'nosniff',
      'cache-control': 'private, max-age=3600',
    },
  });
});
