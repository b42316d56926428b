import { recordRun, type PhotoUpload } from '@/db/queries/fab';
import { appUrl } from '@/app/_server/app-url';
import { ApiError, handle, json, problemsOf } from '@/app/_server/http';
import { revisionAccess } from '@/app/api/designs/_lib/access';
import { readMultipart } from '@/app/api/designs/_lib/multipart';
import { checkImageUpload, makeThumbnail, MAX_IMAGE_BYTES } from '@/lib/images';
import { fabRunSchema, MAX_PHOTOS_PER_RUN } from '@/lib/schemas/fab';

/**
 * Records a fab run (multipart: revisionId, the run fields, and up to MAX_PHOTOS_PER_RUN "photo" files).
 * Every photo is checked from its bytes before anything is stored; one bad photo refuses the whole run.
 */
export const POST = handle(async (request, { requestId }) => {
  const form = await readMultipart(request, MAX_PHOTOS_PER_RUN * MAX_IMAGE_BYTES + 1024 * 1024);
  const revisionId = String(form.get('revisionId') ?? '');
  const { user, revision } = await revisionAccess(revisionId, 'fabRun.record');
  const parsed = fabRunSchema.safeParse(Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === 'string')));
  if (!parsed.success) throw new ApiError(400, 'The run has problems.', problemsOf(parsed.error));

  const files = form.getAll('photo').filter((f): f is File => typeof f !== 'string' && f.size > 0);
  if (files.length > MAX_PHOTOS_PER_RUN) throw new ApiError(400, `At most ${MAX_PHOTOS_PER_RUN} photos per run.`);
  const photos: PhotoUpload[] = [];
  for (const [index, file] of files.entries()) {
    const bytes = new Uint8Array(await file.arrayBuffer());
    const checked = checkImageUpload(bytes);
    if (!checked.ok) {
      throw new ApiError(400, 'A photo was refused; nothing was saved.', [{ path: `photo.${index}`, message: `${file.name}: ${checked.message}` }]);
    }
    let thumbnail: Uint8Array;
    try {
      thumbnail = makeThumbnail(bytes, checked.type).bytes;
    } catch {
      throw new ApiError(400, 'A photo was refused; nothing was saved.', [{ path: `photo.${index}`, message: `${file.name}: the image data is damaged and cannot be decoded.` }]);
    }
    photos.push({ fileName: file.name.slice(0, 200) || `photo-${index + 1}`, mimeType: checked.mime, width: checked.width, height: checked.height, data: bytes, thumbnail });
  }

  const result = await recordRun({ revisionId: revision.id, actorId: user.id, run: parsed.data, photos, appUrl: appUrl() });
  if (!result.ok) throw new ApiError(result.status, result.message);
  return json({ runId: result.runId, movedToFabricated: result.moved, photos: photos.length }, { status: 201, requestId });
});
