import { ApiError } from '@/app/_server/http';

/** Reads a multipart body, refusing (413) one whose declared length is over `maxBytes` before reading it. */
export async function readMultipart(request: Request, maxBytes: number): Promise<FormData> {
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (Number.isFinite(declared) && declared > maxBytes) {
    throw new ApiError(413, `The upload is ${(declared / 1048576).toFixed(1)} MB; at most ${(maxBytes / 1048576).toFixed(0)} MB is accepted.`);
  }
  if (!(request.headers.get('content-type') ?? '').includes('multipart/form-data')) {
    throw new ApiError(415, 'Send the form as multipart/form-data.');
  }
  try {
    return await request.formData();
  } catch {
    throw new ApiError(400, 'The form could not be read; send it again.');
  }
}
