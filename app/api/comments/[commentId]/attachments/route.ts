import { addAttachment } from '@/db/queries/comments';
import { apiError, handle, json } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { MAX_IMAGE_BYTES } from '@/lib/images';

// room for the multipart boundaries and headers around one file
const FORM_OVERHEAD_BYTES = 64 * 1024;

/** Attaches one image (multipart field "file") to one's own comment; PNG or JPEG by content, at most 10 MB. */
export const POST = handle<{ commentId: string }>(async (request, { params }) => {
  const user = await requireUser();
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (Number.isFinite(declared) && declared > MAX_IMAGE_BYTES + FORM_OVERHEAD_BYTES) {
    throw apiError(413, `The upload is ${(declared / 1048576).toFixed(1)} MB; an image may be at most ${MAX_IMAGE_BYTES / 1048576} MB.`);
  }
  if (!(request.headers.get('content-type') ?? '').includes('multipart/form-data')) {
    throw apiError(415, 'Send the image as multipart/form-data in a field named "file".');
  }
  const form = await request.formData().catch(() => null);
  const file = form?.get('file');
  if (!form || !(file instanceof File)) throw apiError(400, 'The form has no image: send it in a field named "file".');
  const outcome = await addAttachment({
    commentId: params.commentId,
    actorId: user.id,
    fileName: file.name,
    bytes: new Uint8Array(await file.arrayBuffer()),
  });
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ attachment: outcome.attachment }, { status: 201 });
});
