import { getBundle } from '@/db/queries/revisions';
import { ApiError, handle } from '@/app/_server/http';
import { revisionAccess } from '@/app/api/designs/_lib/access';

/** The revision's zip, with its file name and SHA-256 (hex in x-content-sha256, base64 in Digest). */
export const GET = handle<{ revisionId: string }>(async (_request, { params }) => {
  const { revision } = await revisionAccess(params.revisionId, 'revision.download');
  const bundle = await getBundle(revision.id);
  if (!bundle) {
    const why = revision.buildStatus === 'failed' ? 'its export failed' : 'its export has not finished yet';
    throw new ApiError(409, `Revision ${revision.number} has no bundle: ${why}.`);
  }
  // pg hands bytea over as a Buffer on an ordinary ArrayBuffer.
  const body = new Uint8Array(bundle.zip.buffer as ArrayBuffer, bundle.zip.byteOffset, bundle.zip.byteLength);
  return new Response(body, {
    headers: {
      'content-type': 'application/zip',
      'content-length': String(body.byteLength),
      'content-disposition': `attachment; filename="${bundle.fileName}"`,
      'x-content-sha256': bundle.sha256,
      digest: `sha-256=${Buffer.from(bundle.sha256, 'hex').toString('base64')}`,
      'cache-control': 'private, no-store',
    },
  });
});
