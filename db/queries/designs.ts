/** Designs, their working script and phase maps. Server code only. */
import { and, desc, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, designs, memberships, phaseMaps, teams, users } from '@/db/schema';
import type { TeamRole } from '@/lib/auth/roles';
import type { ProcessProfile } from '@/lib/schemas/designs';
import type { PhaseMapRecord } from '@/lib/jobs/export-job';

export type DesignRow = typeof designs.$inferSelect;

export interface DesignWithRole {
  design: DesignRow;
  teamName: string;
  /** the viewer's role in the design's team; null when not a member */
  role: TeamRole | null;
}

/** The design and the user's role in its team (role null when the user is not a member). */
export async function getDesignForUser(designId: string, userId: string): Promise<DesignWithRole | null> {
  const rows = await db
    .select({ design: designs, teamName: teams.name, role: memberships.role })
    .from(designs)
    .innerJoin(teams, eq(teams.id, designs.teamId))
    .leftJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .where(eq(designs.id, designId))
    .limit(1);
  return rows[0] ? { design: rows[0].design, teamName: rows[0].teamName, role: rows[0].role ?? null } : null;
}

export interface DesignListItem {
  id: string;
  name: string;
  description: string;
  teamId: string;
  teamName: string;
  role: TeamRole;
  revisionCount: number;
  updatedAt: Date;
  createdByName: string | null;
}

/** Every design in the user's teams, most recently changed first. */
export async function listDesignsForUser(userId: string): Promise<DesignListItem[]> {
  return db
    .select({
      id: designs.id,
      name: designs.name,
      description: designs.description,
      teamId: designs.teamId,
      teamName: teams.name,
      role: memberships.role,
      revisionCount: designs.lastRevisionNumber,
      updatedAt: designs.updatedAt,
      createdByName: users.name,
    })
    .from(designs)
    .innerJoin(memberships, and(eq(memberships.teamId, designs.teamId), eq(memberships.userId, userId)))
    .innerJoin(teams, eq(teams.id, designs.teamId))
    .leftJoin(users, eq(users.id, designs.createdBy))
    .orderBy(desc(designs.updatedAt));
}

/** Teams where the user holds one of `roles`, for the create form. */
export async function teamsWithRole(userId: string, roles: readonly TeamRole[]): Promise<{ id: string; name: string }[]> {
  const rows = await db
    .select({ id: teams.id, name: teams.name, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .orderBy(teams.name);
  return rows.filter((r) => roles.includes(r.role)).map(({ id, name }) => ({ id, name }));
}

export async function createDesign(input: {
  teamId: string;
  name: string;
  description: string;
  processProfile: ProcessProfile;
  script: string;
  userId: string;
}): Promise<DesignRow> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(designs)
      .values({
        teamId: input.teamId,
        name: input.name,
        description: input.description,
        processProfile: input.processProfile,
        workingScript: input.script,
        createdBy: input.userId,
        updatedBy: input.userId,
      })
      .returning();
    await tx.insert(auditEvents).values({
      teamId: input.teamId,
      actorId: input.userId,
      action: 'design.create',
      subjectType: 'design',
      subjectId: row.id,
      details: { name: input.name },
    });
    return row;
  });
}

/** Who changed the design last, for the stale-edit message. */
export interface DesignVersionInfo {
  version: number;
  updatedAt: Date;
  updatedByName: string | null;
}

export type VersionedWrite = { ok: true; version: number } | { ok: false; current: DesignVersionInfo };

async function currentVersion(designId: string): Promise<DesignVersionInfo> {
  const [row] = await db
    .select({ version: designs.version, updatedAt: designs.updatedAt, updatedByName: users.name })
    .from(designs)
    .leftJoin(users, eq(users.id, designs.updatedBy))
    .where(eq(designs.id, designId));
  return row;
}

/** Saves the working script if nobody changed the design since `baseVersion`; otherwise changes nothing. */
export async function saveDraft(designId: string, userId: string, script: string, baseVersion: number): Promise<VersionedWrite> {
  const rows = await db
    .update(designs)
    .set({ workingScript: script, version: sql`${designs.version} + 1`, updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(designs.id, designId), eq(designs.version, baseVersion)))
    .returning({ version: designs.version });
  return rows[0] ? { ok: true, version: rows[0].version } : { ok: false, current: await currentVersion(designId) };
}

/** Changes name, description and process profile if nobody changed the design since `baseVersion`. */
export async function updateDesignSettings(
  designId: string,
  userId: string,
  input: { name: string; description: string; processProfile: ProcessProfile; baseVersion: number },
): Promise<VersionedWrite> {
  const rows = await db
    .update(designs)
    .set({
      name: input.name,
      description: input.description,
      processProfile: input.processProfile,
      version: sql`${designs.version} + 1`,
      updatedBy: userId,
      updatedAt: new Date(),
    })
    .where(and(eq(designs.id, designId), eq(designs.version, input.baseVersion)))
    .returning({ version: designs.version });
  return rows[0] ? { ok: true, version: rows[0].version } : { ok: false, current: await currentVersion(designId) };
}

export interface PhaseMapSummary {
  id: string;
  name: string;
  format: 'png16' | 'csv';
  pitch: number;
  phaseScale: number;
  columns: number;
  rows: number;
  bytes: number;
  createdAt: Date;
}

export async function listPhaseMaps(designId: string): Promise<PhaseMapSummary[]> {
  return db
    .select({
      id: phaseMaps.id,
      name: phaseMaps.name,
      format: phaseMaps.format,
      pitch: phaseMaps.pitch,
      phaseScale: phaseMaps.phaseScale,
      columns: phaseMaps.columns,
      rows: phaseMaps.rows,
      bytes: sql<number>`octet_length(${phaseMaps.data})`.mapWith(Number),
      createdAt: phaseMaps.createdAt,
    })
    .from(phaseMaps)
    .where(eq(phaseMaps.designId, designId))
    .orderBy(phaseMaps.name);
}

/** The raw files of every phase map of a design, for the compiler. */
export async function loadPhaseMaps(designId: string): Promise<PhaseMapRecord[]> {
  const rows = await db
    .select({ name: phaseMaps.name, format: phaseMaps.format, pitch: phaseMaps.pitch, phaseScale: phaseMaps.phaseScale, data: phaseMaps.data })
    .from(phaseMaps)
    .where(eq(phaseMaps.designId, designId));
  return rows.map((r) => ({ ...r, data: new Uint8Array(r.data) }));
}

export type PhaseMapWrite = { ok: true; id: string } | { ok: false; message: string };

/**
 * Stores a validated phase map. A name already in use is refused rather than replaced: saved
 * revisions were exported from the old data and a silent replacement would make them unreproducible.
 */
export async function insertPhaseMap(input: {
  designId: string;
  teamId: string;
  userId: string;
  name: string;
  format: 'png16' | 'csv';
  pitch: number;
  phaseScale: number;
  columns: number;
  rows: number;
  data: Uint8Array;
}): Promise<PhaseMapWrite> {
  return db.transaction(async (tx) => {
    const inserted = await tx
      .insert(phaseMaps)
      .values({
        designId: input.designId,
        name: input.name,
        format: input.format,
        pitch: input.pitch,
        phaseScale: input.phaseScale,
        columns: input.columns,
        rows: input.rows,
        data: Buffer.from(input.data),
        uploadedBy: input.userId,
      })
      .onConflictDoNothing({ target: [phaseMaps.designId, phaseMaps.name] })
      .returning({ id: phaseMaps.id });
    if (!inserted[0]) {
      return { ok: false as const, message: `This design already has a phase map named "${input.name}"; choose another name.` };
    }
    await tx.insert(auditEvents).values({
      teamId: input.teamId,
      actorId: input.userId,
      action: 'phaseMap.upload',
      subjectType: 'design',
      subjectId: input.designId,
      details: { name: input.name, format: input.format, columns: input.columns, rows: input.rows },
    });
    return { ok: true as const, id: inserted[0].id };
  });
}

/** One phase map's file, if it belongs to the design. */
export async function getPhaseMapData(designId: string, phaseMapId: string): Promise<{ format: 'png16' | 'csv'; data: Buffer } | null> {
  const [row] = await db
    .select({ format: phaseMaps.format, data: phaseMaps.data })
    .from(phaseMaps)
    .where(and(eq(phaseMaps.id, phaseMapId), eq(phaseMaps.designId, designId)));
  return row ?? null;
}
