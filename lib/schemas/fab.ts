/** Payload schemas for the fab queue, shared by the run form and its route handler. */
import { z } from 'zod';

export const DOSE_UNITS = ['mJ/cm²', 'µC/cm²'] as const;

const finite = (what: string, unit: string) =>
  z.coerce.number({ error: `${what} must be a number (${unit}).` }).refine(Number.isFinite, `${what} must be a finite number (${unit}).`);

export const fabRunSchema = z.object({
  runDate: z.iso.date('The run date is a calendar date (YYYY-MM-DD).'),
  tool: z.string().trim().min(1, 'Name the exposure tool.').max(120, 'Tool names are at most 120 characters.'),
  dose: finite('The dose', 'per area').pipe(z.number().positive('The dose must be more than 0.').max(1e6, 'The dose must be at most 1000000.')),
  doseUnit: z.enum(DOSE_UNITS, { error: 'The dose unit is mJ/cm² or µC/cm².' }),
  focus: finite('The focus offset', 'µm').pipe(z.number().min(-1000, 'The focus offset must be within ±1000 µm.').max(1000, 'The focus offset must be within ±1000 µm.')),
  resist: z.string().trim().min(1, 'Name the resist.').max(120, 'Resist names are at most 120 characters.'),
  resistThickness: finite('The resist thickness', 'µm').pipe(
    z.number().positive('The resist thickness must be more than 0 µm.').max(100, 'The resist thickness must be at most 100 µm.'),
  ),
  notes: z.string().max(5000, 'Notes are at most 5000 characters.').default(''),
});
export type FabRunInput = z.infer<typeof fabRunSchema>;

/** Photos one run may carry; each is at most 10 MB (lib/images). */
export const MAX_PHOTOS_PER_RUN = 8;
