/**
 * GET  /api/designs/{id}/phase-maps   the design's phase maps (without their data)
 * POST /api/designs/{id}/phase-maps   upload one (multipart: name, format, pitch, phaseScale, file)
 */
import { insertPhaseMap, listPhaseMaps } from '@/db/queries/designs';
import { ApiError, handle, json, problemsOf } from '@/app/_server/http';
import { designAccess } from '@/app/api/designs/_lib/access';
import { readMultipart } from '@/app/api/designs/_lib/multipart';
import { decodePhaseMap } from '@/lib/jobs/phase-maps';
import { MAX_PHASE_MAP_BYTES, phaseMapFieldsSchema } from '@/lib/schemas/designs';

export const GET = handle<{ designId: string }>(async (_request, { params, requestId }) => {
  const { design } = await designAccess(params.designId, 'design.view');
  return json({ maps: await listPhaseMaps(design.id) }, { requestId });
});

export const POST = handle<{ designId: string }>(async (request, { params, requestId }) => {
  const { design, user } = await designAccess(params.designId, 'phaseMap.upload');
  const form = await readMultipart(request, MAX_PHASE_MAP_BYTES + 64 * 1024);
  const fields = phaseMapFieldsSchema.safeParse(Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === 'string')));
  if (!fields.success) throw new ApiError(400, 'The phase map has problems.', problemsOf(fields.error));
  const file = form.get('file');
  if (!file || typeof file === 'string' || file.size === 0) throw new ApiError(400, 'Choose a file to upload.', [{ path: 'file', message: 'no file was sent' }]);
  if (file.size > MAX_PHASE_MAP_BYTES) {
    throw new ApiError(413, `The file is ${(file.size / 1048576).toFixed(1)} MB; phase maps are at most ${MAX_PHASE_MAP_BYTES / 1048576} MB.`);
  }
  const data = new Uint8Array(await file.arrayBuffer());
  // The declared format must match the bytes: a PNG signature for png16, text for CSV.
  const looksPng = data.length >= 8 && data[0] === 0x89 && data[1] === 0x50 && data[2] === 0x4e && data[3] === 0x47;
  if (fields.data.format === 'png16' && !looksPng) throw new ApiError(400, `${file.name} is not a PNG image, though the format says 16-bit PNG.`);
  if (fields.data.format === 'csv' && looksPng) throw new ApiError(400, `${file.name} is a PNG image, though the format says CSV.`);
  const decoded = decodePhaseMap({ ...fields.data, data });
  if (!decoded.ok) throw new ApiError(400, `${file.name} was refused: ${decoded.error}.`);
  const stored = await insertPhaseMap({
    designId: design.id,
    teamId: design.teamId,
    userId: user.id,
    name: fields.data.name,
    format: fields.data.format,
    pitch: fields.data.pitch,
    phaseScale: fields.data.phaseScale,
    columns: decoded.map.columns,
    rows: decoded.map.rows,
    data,
  });
  if (!stored.ok) throw new ApiError(409, stored.message);
  return json({ name: fields.data.name, maps: await listPhaseMaps(design.id) }, { status: 201, requestId });
});
