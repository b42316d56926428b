/** Revisions: numbering, the export job's store, history, bundles. Server code only. */
import { and, desc, eq, getTableColumns, inArray, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, designs, memberships, revisions, teams, users } from '@/db/schema';
import type { BuildStatus } from '@/db/schema';
import type { TeamRole } from '@/lib/auth/roles';
import type { ExportInput, ExportOutcome, ExportStore } from '@/lib/jobs/export-job';
import type { FocusOutcome, FocusStore } from '@/lib/jobs/focus-job';
import { loadPhaseMaps } from './designs';

// Everything but the bundle bytes, so lists and pages never pull megabytes they do not show.
const { bundle: _bundle, ...summaryColumns } = getTableColumns(revisions);

export type RevisionSummary = Omit<typeof revisions.$inferSelect, 'bundle'> & { authorName: string | null };

// The history needs neither the reports nor the manifests (tens to hundreds of kB each once checked).
const { report: _report, manifest: _manifest, parameters: _parameters, ...listColumns } = summaryColumns;

export type RevisionListItem = Omit<RevisionSummary, 'report' | 'manifest' | 'parameters'>;

export interface NewRevision {
  designId: string;
  authorId: string;
  source: string;
  message: string;
  /** the design version the page was showing; the working script is updated only if it still matches */
  baseVersion: number;
}

export interface CreatedRevision {
  id: string;
  number: number;
  /** the design's version after the save, or null when someone else changed the draft meanwhile */
  designVersion: number | null;
}

/**
 * Numbers and stores a new revision. The design row is locked FOR UPDATE while its counter moves, so
 * concurrent saves queue up and each gets the next number; the unique (design, number) index backs it up.
 */
export async function createRevision(input: NewRevision): Promise<CreatedRevision> {
  return db.transaction(async (tx) => {
    const locked = await tx
      .select({
        teamId: designs.teamId,
        last: designs.lastRevisionNumber,
        version: designs.version,
        processProfile: designs.processProfile,
      })
      .from(designs)
      .where(eq(designs.id, input.designId))
      .for('update');
    const design = locked[0];
    if (!design) throw new Error(`design ${input.designId} does not exist`);
    const number = design.last + 1;
    const draftCurrent = design.version === input.baseVersion;
    const [updated] = await tx
      .update(designs)
      .set({
        lastRevisionNumber: number,
        updatedAt: new Date(),
        updatedBy: input.authorId,
        // Saving also stores the draft, unless the draft moved on elsewhere: then it is left alone.
        ...(draftCurrent ? { workingScript: input.source, version: sql`${designs.version} + 1` } : {}),
      })
      .where(eq(designs.id, input.designId))
      .returning({ version: designs.version });
    const [row] = await tx
      .insert(revisions)
      .values({
        designId: input.designId,
        number,
        authorId: input.authorId,
        message: input.message,
        source: input.source,
        processProfile: design.processProfile,
        buildStatus: 'queued',
        buildStage: 'waiting for the export worker',
      })
      .returning({ id: revisions.id });
    await tx.insert(auditEvents).values({
      teamId: design.teamId,
      actorId: input.authorId,
      action: 'revision.save',
      subjectType: 'revision',
      subjectId: row.id,
      details: { designId: input.designId, number },
    });
    return { id: row.id, number, designVersion: draftCurrent ? updated.version : null };
  });
}

export interface RevisionWithAccess {
  revision: RevisionSummary;
  designName: string;
  teamId: string;
  teamName: string;
  role: TeamRole | null;
}

/** A revision (without bundle bytes), its design and team, and the user's role in that team. */
export async function getRevisionForUser(revisionId: string, userId: string): Promise<RevisionWithAccess | null> {
  const rows = await db
    .select({
      revision: { ...summaryColumns, authorName: users.name },
      designName: designs.name,
      teamId: designs.teamId,
      teamName: teams.name,
      role: memberships.role,
    })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .innerJoin(teams, eq(teams.id, designs.teamId))
    .leftJoin(users, eq(users.id, revisions.authorId))
    .leftJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .where(eq(revisions.id, revisionId))
    .limit(1);
  const r = rows[0];
  return r ? { ...r, role: r.role ?? null } : null;
}

/** Every revision of a design, newest first, without bundle bytes, reports or manifests. */
export async function listRevisions(designId: string): Promise<RevisionListItem[]> {
  return db
    .select({ ...listColumns, authorName: users.name })
    .from(revisions)
    .leftJoin(users, eq(users.id, revisions.authorId))
    .where(eq(revisions.designId, designId))
    .orderBy(desc(revisions.number));
}

export interface StoredBundle {
  zip: Buffer;
  sha256: string;
  fileName: string;
}

/** The zip of a ready revision, or null when it has none (still building or failed). */
export async function getBundle(revisionId: string): Promise<StoredBundle | null> {
  const [row] = await db
    .select({ zip: revisions.bundle, sha256: revisions.bundleSha256, number: revisions.number, designName: designs.name })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'ready')));
  if (!row?.zip || !row.sha256) return null;
  return { zip: row.zip, sha256: row.sha256, fileName: bundleFileName(row.designName, row.number) };
}

/** e.g. "two-focus-lens-r3.zip": the design name reduced to safe characters, then the revision number. */
export function bundleFileName(designName: string, number: number): string {
  const slug = designName
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase()
    .slice(0, 60);
  return `${slug || 'design'}-r${number}.zip`;
}

/** Puts a failed revision back in the queue; false when it is not failed (nothing changes then). */
export async function requeueFailed(revisionId: string, actorId: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    const rows = await tx
      .update(revisions)
      .set({ buildStatus: 'queued', buildError: null, buildProgress: 0, buildStage: 'waiting for the export worker' })
      .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'failed')))
      .returning({ designId: revisions.designId, number: revisions.number });
    if (!rows[0]) return false;
    const [design] = await tx.select({ teamId: designs.teamId }).from(designs).where(eq(designs.id, rows[0].designId));
    await tx.insert(auditEvents).values({
      teamId: design.teamId,
      actorId,
      action: 'revision.retryExport',
      subjectType: 'revision',
      subjectId: revisionId,
      details: { number: rows[0].number },
    });
    return true;
  });
}

/** Marks a revision failed unless it already finished; used when a job cannot even be queued or was dead-lettered. */
export async function markBuildFailed(revisionId: string, message: string): Promise<void> {
  await db
    .update(revisions)
    .set({ buildStatus: 'failed', buildError: message, buildFinishedAt: new Date() })
    .where(and(eq(revisions.id, revisionId), inArray(revisions.buildStatus, ['queued', 'running'] satisfies BuildStatus[])));
}

/** The export job's view of the revisions table. */
export const exportStore: ExportStore = {
  async claim(revisionId): Promise<ExportInput | null> {
    // A retry after a crash finds the revision still running; it starts over from nothing.
    const rows = await db
      .update(revisions)
      .set({
        buildStatus: 'running',
        buildAttempts: sql`${revisions.buildAttempts} + 1`,
        buildStartedAt: new Date(),
        buildProgress: 0,
        buildStage: 'starting',
        buildError: null,
      })
      .where(and(eq(revisions.id, revisionId), inArray(revisions.buildStatus, ['queued', 'running'] satisfies BuildStatus[])))
      .returning({
        source: revisions.source,
        processProfile: revisions.processProfile,
        designId: revisions.designId,
        number: revisions.number,
        createdAt: revisions.createdAt,
      });
    const row = rows[0];
    if (!row) return null;
    const [design] = await db.select({ name: designs.name }).from(designs).where(eq(designs.id, row.designId));
    return {
      source: row.source,
      processProfile: row.processProfile,
      designId: row.designId,
      designName: design?.name ?? 'design',
      revisionId,
      revisionNumber: row.number,
      savedAt: row.createdAt.toISOString(),
      phaseMaps: await loadPhaseMaps(row.designId),
    };
  },

  async progress(revisionId, fraction, stage) {
    await db
      .update(revisions)
      .set({ buildProgress: fraction, buildStage: stage })
      .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'running')));
  },

  async complete(revisionId, outcome: ExportOutcome) {
    // One UPDATE: the bundle, its checksum and everything derived from it appear together or not at all.
    const rows = await db
      .update(revisions)
      .set({
        buildStatus: 'ready',
        buildProgress: 1,
        buildStage: 'done',
        buildError: null,
        buildFinishedAt: new Date(),
        parameters: outcome.parameters,
        report: outcome.report,
        manifest: outcome.manifest,
        bundle: Buffer.from(outcome.zip.buffer, outcome.zip.byteOffset, outcome.zip.byteLength),
        bundleSha256: outcome.sha256,
        bundleBytes: outcome.zip.byteLength,
        zoneCount: outcome.zoneCount,
        narrowestFeature: outcome.narrowestFeature,
      })
      .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'running')))
      .returning({ id: revisions.id });
    return rows.length === 1;
  },

  async fail(revisionId, message) {
    await markBuildFailed(revisionId, message);
  },
};

/** The focus-check job's view: ready revisions without a cached check, and the cache itself (report.focusCheck). */
export const focusStore: FocusStore = {
  async load(revisionId) {
    const [row] = await db
      .select({ source: revisions.source, processProfile: revisions.processProfile, designId: revisions.designId })
      .from(revisions)
      .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'ready'), sql`NOT (${revisions.report} ? 'focusCheck')`));
    if (!row) return null;
    return { source: row.source, processProfile: row.processProfile, phaseMaps: await loadPhaseMaps(row.designId) };
  },

  async save(revisionId, outcome: FocusOutcome) {
    await db
      .update(revisions)
      .set({ report: sql`jsonb_set(${revisions.report}, '{focusCheck}', ${JSON.stringify(outcome)}::jsonb)` })
      .where(and(eq(revisions.id, revisionId), eq(revisions.buildStatus, 'ready')));
  },
};
