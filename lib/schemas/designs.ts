/**
 * Payload schemas for designs, revisions and phase maps, shared by the forms and the route handlers.
 * Lengths in µm; phase in radians.
 */
import { z } from 'zod';
import { MAX_SCRIPT_LENGTH } from '@/lib/lang';

/** Longest script a design accepts (the language's own limit); larger texts are refused before they reach the compiler. */
export const MAX_SCRIPT_CHARS = MAX_SCRIPT_LENGTH;
export const MAX_MESSAGE_CHARS = 500;
/** Phase-map files above this size are refused before they are parsed. */
export const MAX_PHASE_MAP_BYTES = 8 * 1024 * 1024;

const micrometres = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number (µm).` })
    .refine(Number.isFinite, `${what} must be a finite number (µm).`)
    .min(min, `${what} must be at least ${min} µm.`)
    .max(max, `${what} must be at most ${max} µm.`);

const layerNumber = z.number().int('Layer and datatype numbers are whole numbers.').min(0, 'Layer and datatype numbers start at 0.').max(32767, 'Layer and datatype numbers go up to 32767 (GDSII stores them as signed 16-bit integers).');

export const LAYER_PURPOSES = ['zones', 'level', 'label', 'aperture', 'marker'] as const;

export const layerAssignmentSchema = z.object({
  purpose: z.enum(LAYER_PURPOSES),
  /** for purpose 'level': the mask index k, 1-based */
  levelIndex: z.number().int().min(1).max(8).optional(),
  layer: layerNumber,
  datatype: layerNumber,
  name: z.string().trim().min(1, 'Every layer needs a name.').max(60, 'Layer names are at most 60 characters.'),
});
export type LayerAssignment = z.infer<typeof layerAssignmentSchema>;

export const processProfileSchema = z
  .object({
    /** smallest line or space the process resolves */
    minimumFeature: micrometres('Minimum feature', 0.001, 1000),
    /** size of one database unit */
    databaseUnit: micrometres('Database unit', 0.0001, 1),
    /** largest distance of a polygon edge from the true curve */
    chordTolerance: micrometres('Chord tolerance', 0.0001, 10),
    /** resist tone the fab exposes with: positive (exposed resist is removed) or negative */
    tone: z.enum(['positive', 'negative']),
    layerMap: z.array(layerAssignmentSchema).min(1, 'The layer map needs at least the zones layer.').max(32),
    processNotes: z.string().max(4000, 'Process notes are at most 4000 characters.'),
  })
  // The geometry engine's own rule (lib/geometry/options.ts): no finer than a tenth of the grid.
  .refine((p) => p.chordTolerance >= p.databaseUnit / 10, {
    message: 'The chord tolerance must be at least a tenth of the database unit.',
    path: ['chordTolerance'],
  })
  .refine((p) => new Set(p.layerMap.map((l) => `${l.layer}/${l.datatype}`)).size === p.layerMap.length, {
    message: 'Two layer-map rows use the same layer and datatype.',
    path: ['layerMap'],
  });
export type ProcessProfile = z.infer<typeof processProfileSchema>;

/** A starting profile for a new design: 1 nm grid, 10 nm chords (common practice, no source); layers as the geometry writes them. */
export const DEFAULT_PROCESS_PROFILE: ProcessProfile = {
  minimumFeature: 0.5,
  databaseUnit: 0.001,
  chordTolerance: 0.01,
  tone: 'positive',
  layerMap: [
    { purpose: 'zones', layer: 1, datatype: 0, name: 'zones' },
    { purpose: 'label', layer: 10, datatype: 0, name: 'label' },
  ],
  processNotes: '',
};

export const scriptSchema = z
  .string()
  .max(MAX_SCRIPT_CHARS, `The script is longer than ${MAX_SCRIPT_CHARS.toLocaleString('en')} characters; split it or move data into a phase map.`);

export const createDesignSchema = z.object({
  teamId: z.uuid('Choose a team.'),
  name: z.string().trim().min(1, 'Give the design a name.').max(120, 'Names are at most 120 characters.'),
  description: z.string().trim().max(2000, 'Descriptions are at most 2000 characters.').default(''),
  /** name of a file in examples/ to start from, without ".zw" */
  example: z
    .string()
    .regex(/^[a-z0-9-]{1,60}$/, 'Unknown example.')
    .optional(),
  processProfile: processProfileSchema.default(DEFAULT_PROCESS_PROFILE),
});
export type CreateDesignInput = z.infer<typeof createDesignSchema>;

/** Every change to a design says which version it was made from; a newer version in the database wins. */
const baseVersion = z.number().int().min(1);

export const saveDraftSchema = z.object({ script: scriptSchema, baseVersion });

export const updateDesignSchema = z.object({
  baseVersion,
  name: createDesignSchema.shape.name,
  description: z.string().trim().max(2000, 'Descriptions are at most 2000 characters.'),
  processProfile: processProfileSchema,
});

export const saveRevisionSchema = z.object({
  script: scriptSchema.refine((s) => s.trim().length > 0, 'The script is empty.'),
  message: z.string().trim().min(1, 'Say in a few words what this revision changes.').max(MAX_MESSAGE_CHARS, `Messages are at most ${MAX_MESSAGE_CHARS} characters.`),
  baseVersion,
});
export type SaveRevisionInput = z.infer<typeof saveRevisionSchema>;

/** The name the script passes to phase_map("…"): a letter or _, then letters, digits, _ or -. */
export const phaseMapNameSchema = z
  .string()
  .regex(/^[A-Za-z_][A-Za-z0-9_-]{0,63}$/, 'A phase-map name starts with a letter or _ and holds only letters, digits, _ and - (at most 64).');

/** The form fields that come with an uploaded phase-map file (multipart, so numbers arrive as text). */
export const phaseMapFieldsSchema = z.object({
  name: phaseMapNameSchema,
  format: z.enum(['png16', 'csv'], { error: 'The format is a 16-bit grayscale PNG or a CSV grid.' }),
  pitch: z.coerce
    .number({ error: 'The pitch must be a number (µm).' })
    .positive('The pitch must be more than 0 µm.')
    .max(10_000, 'The pitch must be at most 10000 µm.'),
  phaseScale: z.coerce
    .number({ error: 'The phase scale must be a number (rad).' })
    .positive('The phase scale must be more than 0 rad.')
    .max(1e6, 'The phase scale must be at most 1000000 rad.'),
});
export type PhaseMapFields = z.infer<typeof phaseMapFieldsSchema>;
