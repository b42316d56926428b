/**
 * Designs, their saved revisions with the export bundle, phase maps, and fab runs with photos.
 * First version by the foundation; the workspace area owns it from here.
 */
import { customType, date, doublePrecision, index, integer, jsonb, pgTable, real, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { teams, users } from './core';

/** Binary column (PostgreSQL bytea) read and written as a Node Buffer. */
export const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => 'bytea',
});

const stamp = (name: string) => timestamp(name, { withTimezone: true, mode: 'date' });

export const designs = pgTable(
  'designs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    /** Fabrication process settings; shape is `ProcessProfile` in lib/schemas/designs.ts. */
    processProfile: jsonb('process_profile').$type<Record<string, unknown>>().notNull().default({}),
    /** The script as last edited, saved or not. */
    workingScript: text('working_script').notNull().default(''),
    /** Bumped on every change of the working script or settings, so a stale page cannot overwrite newer work. */
    version: integer('version').notNull().default(1),
    /** The last revision number handed out; locked FOR UPDATE while a revision is numbered. */
    lastRevisionNumber: integer('last_revision_number').notNull().default(0),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: stamp('created_at').notNull().defaultNow(),
    updatedAt: stamp('updated_at').notNull().defaultNow(),
  },
  (t) => [index('designs_team_idx').on(t.teamId)],
);

/** Where a revision's export job stands; independent of its review state. */
export const BUILD_STATUSES = ['queued', 'running', 'ready', 'failed'] as const;
export type BuildStatus = (typeof BUILD_STATUSES)[number];

export const revisions = pgTable(
  'revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    designId: uuid('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    /** 1, 2, 3... per design. */
    number: integer('number').notNull(),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    message: text('message').notNull().default(''),
    /** The script exactly as saved. */
    source: text('source').notNull(),
    /** A state from lib/workflow/states.ts. */
    state: text('state').notNull().default('draft'),
    createdAt: stamp('created_at').notNull().defaultNow(),
    /** The process profile the revision was saved with (frozen copy). */
    processProfile: jsonb('process_profile').$type<Record<string, unknown>>().notNull().default({}),
    buildStatus: text('build_status', { enum: BUILD_STATUSES }).notNull().default('queued'),
    /** 0..1 while running */
    buildProgress: real('build_progress').notNull().default(0),
    buildStage: text('build_stage').notNull().default(''),
    buildError: text('build_error'),
    buildAttempts: integer('build_attempts').notNull().default(0),
    buildStartedAt: stamp('build_started_at'),
    buildFinishedAt: stamp('build_finished_at'),
    /** Written by the export job, all together with the bundle, in one statement. */
    parameters: jsonb('parameters').$type<Record<string, unknown>>(),
    report: jsonb('report').$type<Record<string, unknown>>(),
    manifest: jsonb('manifest').$type<Record<string, unknown>>(),
    bundle: bytea('bundle'),
    bundleSha256: text('bundle_sha256'),
    bundleBytes: integer('bundle_bytes'),
    zoneCount: integer('zone_count'),
    /** µm */
    narrowestFeature: doublePrecision('narrowest_feature'),
  },
  (t) => [
    uniqueIndex('revisions_design_number_unique').on(t.designId, t.number),
    index('revisions_state_idx').on(t.state),
  ],
);

export const PHASE_MAP_FORMATS = ['png16', 'csv'] as const;

/** A sampled phase map uploaded to a design and referenced by name from its script. */
export const phaseMaps = pgTable(
  'phase_maps',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    designId: uuid('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    format: text('format', { enum: PHASE_MAP_FORMATS }).notNull(),
    /** sample spacing, µm */
    pitch: doublePrecision('pitch').notNull(),
    /** radians per unit of the stored value (CSV) or per full 16-bit range (PNG) */
    phaseScale: doublePrecision('phase_scale').notNull(),
    columns: integer('columns').notNull(),
    rows: integer('rows').notNull(),
    /** the uploaded file, byte for byte */
    data: bytea('data').notNull(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: stamp('created_at').notNull().defaultNow(),
  },
  (t) => [uniqueIndex('phase_maps_design_name_unique').on(t.designId, t.name)],
);

/** What fab staff record about one exposure of a released revision. */
export const fabRuns = pgTable(
  'fab_runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => revisions.id, { onDelete: 'cascade' }),
    recordedBy: uuid('recorded_by').references(() => users.id, { onDelete: 'set null' }),
    runDate: date('run_date', { mode: 'string' }).notNull(),
    tool: text('tool').notNull(),
    dose: doublePrecision('dose').notNull(),
    /** e.g. mJ/cm² (optical) or µC/cm² (e-beam) */
    doseUnit: text('dose_unit').notNull(),
    /** focus offset, µm */
    focus: doublePrecision('focus').notNull(),
    resist: text('resist').notNull(),
    /** resist thickness, µm */
    resistThickness: doublePrecision('resist_thickness').notNull(),
    notes: text('notes').notNull().default(''),
    createdAt: stamp('created_at').notNull().defaultNow(),
  },
  (t) => [index('fab_runs_revision_idx').on(t.revisionId)],
);

export const fabPhotos = pgTable(
  'fab_photos',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    fabRunId: uuid('fab_run_id')
      .notNull()
      .references(() => fabRuns.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    /** image/png or image/jpeg, from the content bytes */
    mimeType: text('mime_type').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    data: bytea('data').notNull(),
    /** JPEG preview from lib/images (longest side THUMBNAIL_SIDE) */
    thumbnail: bytea('thumbnail').notNull(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: stamp('created_at').notNull().defaultNow(),
  },
  (t) => [index('fab_photos_run_idx').on(t.fabRunId)],
);
