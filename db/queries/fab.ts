/** The fab queue: released revisions, their runs and inspection photos. Server code only. */
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, designs, fabPhotos, fabRuns, memberships, revisions, teams, users } from '@/db/schema';
import { can, type TeamRole } from '@/lib/auth';
import type { FabRunInput } from '@/lib/schemas/fab';
import { applyMoveInTransaction, type Outcome, refuse, type SentNotification } from './review';

export interface BundleLayer {
  layer: number;
  datatype: number;
  name: string;
  purpose: string;
  meaning?: string;
  tone?: string;
}

export interface FabQueueItem {
  revisionId: string;
  number: number;
  state: string;
  message: string;
  designId: string;
  designName: string;
  teamName: string;
  role: TeamRole;
  processProfile: Record<string, unknown>;
  /** the layers as the bundle's manifest lists them, with what each means for the fab */
  layers: BundleLayer[] | null;
  bundleSha256: string | null;
  bundleBytes: number | null;
  zoneCount: number | null;
  narrowestFeature: number | null;
  createdAt: Date;
}

/** Revisions released to fab (and those already fabricated) in the user's teams, newest first. */
export async function listFabQueue(userId: string): Promise<FabQueueItem[]> {
  return db
    .select({
      revisionId: revisions.id,
      number: revisions.number,
      state: revisions.state,
      message: revisions.message,
      designId: designs.id,
      designName: designs.name,
      teamName: teams.name,
      role: memberships.role,
      processProfile: revisions.processProfile,
      layers: sql<BundleLayer[] | null>`${revisions.manifest} -> 'layers'`,
      bundleSha256: revisions.bundleSha256,
      bundleBytes: revisions.bundleBytes,
      zoneCount: revisions.zoneCount,
      narrowestFeature: revisions.narrowestFeature,
      createdAt: revisions.createdAt,
    })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .innerJoin(teams, eq(teams.id, designs.teamId))
    .innerJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .where(inArray(revisions.state, ['released', 'fabricated']))
    .orderBy(desc(revisions.createdAt));
}

export interface FabPhotoSummary {
  id: string;
  fileName: string;
  mimeType: string;
  width: number;
  height: number;
}

export interface FabRunView {
  id: string;
  revisionId: string;
  runDate: string;
  tool: string;
  dose: number;
  doseUnit: string;
  focus: number;
  resist: string;
  resistThickness: number;
  notes: string;
  recordedByName: string | null;
  createdAt: Date;
  photos: FabPhotoSummary[];
}

/** Every run recorded for the given revisions, with their photos (without the image bytes). */
export async function listRuns(revisionIds: string[]): Promise<FabRunView[]> {
  if (revisionIds.length === 0) return [];
  const runs = await db
    .select({
      id: fabRuns.id,
      revisionId: fabRuns.revisionId,
      runDate: fabRuns.runDate,
      tool: fabRuns.tool,
      dose: fabRuns.dose,
      doseUnit: fabRuns.doseUnit,
      focus: fabRuns.focus,
      resist: fabRuns.resist,
      resistThickness: fabRuns.resistThickness,
      notes: fabRuns.notes,
      recordedByName: users.name,
      createdAt: fabRuns.createdAt,
    })
    .from(fabRuns)
    .leftJoin(users, eq(users.id, fabRuns.recordedBy))
    .where(inArray(fabRuns.revisionId, revisionIds))
    .orderBy(desc(fabRuns.createdAt));
  const photos =
    runs.length === 0
      ? []
      : await db
          .select({
            id: fabPhotos.id,
            fabRunId: fabPhotos.fabRunId,
            fileName: fabPhotos.fileName,
            mimeType: fabPhotos.mimeType,
            width: fabPhotos.width,
            height: fabPhotos.height,
          })
          .from(fabPhotos)
          .where(inArray(fabPhotos.fabRunId, runs.map((r) => r.id)))
          .orderBy(fabPhotos.createdAt);
  return runs.map((run) => ({
    ...run,
    photos: photos.filter((p) => p.fabRunId === run.id).map(({ fabRunId: _run, ...p }) => p),
  }));
}

export interface PhotoUpload {
  fileName: string;
  mimeType: 'image/png' | 'image/jpeg';
  width: number;
  height: number;
  data: Uint8Array;
  thumbnail: Uint8Array;
}

/**
 * Records a run with its photos. The first run of a released revision also moves it to fabricated
 * (through the review moves, so the audit trail and e-mails stay in one place); later runs of a
 * fabricated revision are added as they are. Everything is one transaction: a refusal stores nothing.
 */
export async function recordRun(input: {
  revisionId: string;
  actorId: string;
  run: FabRunInput;
  photos: PhotoUpload[];
  appUrl: string;
}): Promise<Outcome<{ runId: string; moved: boolean; notifications: SentNotification[] }>> {
  const pending = await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ state: revisions.state, teamId: designs.teamId, role: memberships.role, number: revisions.number })
      .from(revisions)
      .innerJoin(designs, eq(designs.id, revisions.designId))
      .leftJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, input.actorId)))
      .where(eq(revisions.id, input.revisionId))
      .for('update', { of: revisions });
    if (!row || !row.role) return refuse(404, 'No such revision, or it belongs to a team you are not in.');
    if (!can({ userId: input.actorId, role: row.role }, 'fabRun.record')) return refuse(403, `Your role (${row.role}) may not record fab runs.`);
    let notify: (() => Promise<SentNotification[]>) | null = null;
    if (row.state === 'released') {
      const moved = await applyMoveInTransaction(tx, {
        revisionId: input.revisionId,
        actorId: input.actorId,
        move: 'markFabricated',
        expectedState: 'released',
        appUrl: input.appUrl,
      });
      if (!moved.ok) return moved;
      notify = moved.notify;
    } else if (row.state !== 'fabricated') {
      return refuse(409, `Revision ${row.number} has not been released to fab, so no run can be recorded for it. Nothing was saved.`);
    }
    const [run] = await tx
      .insert(fabRuns)
      .values({ revisionId: input.revisionId, recordedBy: input.actorId, ...input.run })
      .returning({ id: fabRuns.id });
    if (input.photos.length > 0) {
      await tx.insert(fabPhotos).values(
        input.photos.map((p) => ({
          fabRunId: run.id,
          fileName: p.fileName,
          mimeType: p.mimeType,
          width: p.width,
          height: p.height,
          data: Buffer.from(p.data),
          thumbnail: Buffer.from(p.thumbnail),
          uploadedBy: input.actorId,
        })),
      );
    }
    await tx.insert(auditEvents).values({
      teamId: row.teamId,
      actorId: input.actorId,
      action: 'fabRun.record',
      subjectType: 'revision',
      subjectId: input.revisionId,
      details: { runId: run.id, revisionNumber: row.number, photos: input.photos.length, tool: input.run.tool },
    });
    return { ok: true as const, runId: run.id, moved: notify !== null, notify };
  });
  if (!pending.ok) return pending;
  const notifications = pending.notify ? await pending.notify() : [];
  return { ok: true, runId: pending.runId, moved: pending.moved, notifications };
}

/** A photo's bytes (or its thumbnail) with the team it belongs to, for the permission check. */
export async function getPhoto(
  photoId: string,
  userId: string,
  size: 'full' | 'thumbnail',
): Promise<{ bytes: Buffer; mimeType: string; fileName: string; role: TeamRole | null } | null> {
  const [row] = await db
    .select({
      data: size === 'full' ? fabPhotos.data : fabPhotos.thumbnail,
      mimeType: fabPhotos.mimeType,
      fileName: fabPhotos.fileName,
      role: memberships.role,
    })
    .from(fabPhotos)
    .innerJoin(fabRuns, eq(fabRuns.id, fabPhotos.fabRunId))
    .innerJoin(revisions, eq(revisions.id, fabRuns.revisionId))
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .leftJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .where(eq(fabPhotos.id, photoId));
  if (!row) return null;
  return {
    bytes: row.data,
    mimeType: size === 'full' ? row.mimeType : 'image/jpeg',
    fileName: row.fileName,
    role: row.role ?? null,
  };
}
