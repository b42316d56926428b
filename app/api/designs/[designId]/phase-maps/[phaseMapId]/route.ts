import { getPhaseMapData } from '@/db/queries/designs';
import { ApiError, handle } from '@/app/_server/http';
import { designAccess } from '@/app/api/designs/_lib/access';

/** The uploaded file of one phase map, byte for byte (the live preview compiles with it). */
export const GET = handle<{ designId: string; phaseMapId: string }>(async (_request, { params }) => {
  const { design } = await designAccess(params.designId, 'design.view');
  const map = /^[0-9a-f-]{36}$/i.test(params.phaseMapId) ? await getPhaseMapData(design.id, params.phaseMapId) : null;
  if (!map) throw new ApiError(404, 'No such phase map.');
  const body = new Uint8Array(map.data.buffer as ArrayBuffer, map.data.byteOffset, map.data.byteLength);
  return new Response(body, {
    headers: {
      'content-type': map.format === 'png16' ? 'image/png' : 'text/csv; charset=utf-8',
      'content-length': String(body.byteLength),
      'cache-control': 'private, max-age=86400, immutable',
    },
  });
});
