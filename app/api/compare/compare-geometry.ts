/** Server side of Compare: both revisions' stored bundles read back and their masks XORed per layer. */
import { db } from '@/db';
import { REVISION_NOT_FOUND, loadRevisionAccess, refuse, type Outcome, type RevisionAccess } from '@/db/queries/review';
import { getBundle } from '@/db/queries/revisions';
import { can } from '@/lib/auth/permissions';
import { BundleReadError, readBundleLayout, type BundleLayout } from '@/lib/workflow/bundle-layout';
import { geometryDifference, manifestLayerNames, type GeometryDifference } from '@/lib/workflow/geometry-difference';

/** The revision, when the user may download its bundle and it has one. */
async function downloadable(revisionId: string, userId: string): Promise<Outcome<{ access: RevisionAccess }>> {
  const access = await loadRevisionAccess(db, revisionId, userId);
  if (!access || !can({ userId, role: access.role }, 'revision.download')) return refuse(404, REVISION_NOT_FOUND);
  if (access.revision.buildStatus !== 'ready') {
    return refuse(409, `Revision ${access.revision.number} has no bundle to compare yet (its export is ${access.revision.buildStatus}).`);
  }
  return { ok: true, access };
}

async function storedLayout(access: RevisionAccess): Promise<Outcome<{ layout: BundleLayout }>> {
  const bundle = await getBundle(access.revision.id);
  if (!bundle) return refuse(409, `Revision ${access.revision.number} has no bundle to compare.`);
  try {
    return { ok: true, layout: await readBundleLayout(new Uint8Array(bundle.zip)) };
  } catch (error) {
    if (error instanceof BundleReadError) return refuse(409, `Revision ${access.revision.number}: ${error.message}`);
    throw error;
  }
}

// Revisions are immutable, so a computed difference stays true; keep the last few for page reloads.
const differenceCache = new Map<string, GeometryDifference>();
const DIFFERENCE_CACHE_SIZE = 6;

/** The per-layer XOR of two revisions' masks, read back from their stored bundles (A before, B after). */
export async function compareRevisionGeometry(a: string, b: string, userId: string): Promise<Outcome<{ difference: GeometryDifference }>> {
  const [before, after] = await Promise.all([downloadable(a, userId), downloadable(b, userId)]);
  if (!before.ok) return before;
  if (!after.ok) return after;
  const key = `${a}:${b}`;
  const cached = differenceCache.get(key);
  if (cached) return { ok: true, difference: cached };
  const [la, lb] = await Promise.all([storedLayout(before.access), storedLayout(after.access)]);
  if (!la.ok) return la;
  if (!lb.ok) return lb;
  let difference: GeometryDifference;
  try {
    difference = geometryDifference(la.layout.library, lb.layout.library, {
      layerNames: manifestLayerNames(la.layout.manifest, lb.layout.manifest),
    });
  } catch (error) {
    return refuse(409, error instanceof Error ? error.message : String(error));
  }
  differenceCache.set(key, difference);
  if (differenceCache.size > DIFFERENCE_CACHE_SIZE) differenceCache.delete(differenceCache.keys().next().value as string);
  return { ok: true, difference };
}
