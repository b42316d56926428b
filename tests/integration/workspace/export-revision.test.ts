/**
 * The worker's real exporter (no database): a script that samples an uploaded phase map by name
 * exports a bundle whose files match the manifest's checksums (read back with JSZip, a reference
 * reader), and a missing map is refused with a message naming it.
 */
import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { ExportRefused, type ExportInput } from '@/lib/jobs/export-job';
import { exportRevision } from '@/lib/jobs/export-revision';

// A tilt ramp of 0 … 3 rad across 4 columns, 2 µm apart (radians per CSV unit: 1).
const RAMP = '0,1,2,3\n0,1,2,3\n0,1,2,3\n';
const SCRIPT = `wavelength 405 nm
aperture circle(diameter: 40 um)
profile phase_map("tilt-ramp") + lens(focal: 400 um)
quantize binary(duty: 0.5, modulation: phase, index: 1.6)
`;

function input(source: string, withMap: boolean): ExportInput {
  return {
    source,
    processProfile: { chordTolerance: 0.02, minimumFeature: 0.3 },
    phaseMaps: withMap ? [{ name: 'tilt-ramp', format: 'csv', pitch: 2, phaseScale: 1, data: new TextEncoder().encode(RAMP) }] : [],
    designId: '00000000-0000-0000-0000-000000000001',
    designName: 'Ramp test · lens',
    revisionId: '00000000-0000-0000-0000-000000000002',
    revisionNumber: 3,
    savedAt: '2026-12-01T12:00:00.000Z',
  };
}

describe('exportRevision', () => {
  it('exports a design that samples an uploaded phase map, with every manifest checksum right', async () => {
    const stages: string[] = [];
    const out = await exportRevision(input(SCRIPT, true), (_f, stage) => stages.push(stage));
    expect(out.sha256).toBe(createHash('sha256').update(out.zip).digest('hex'));
    const zip = await JSZip.loadAsync(out.zip);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string')) as { files: { name: string; sha256: string; bytes: number }[]; revision: { number: number } };
    expect(manifest.revision.number).toBe(3);
    for (const f of manifest.files) {
      const bytes = await zip.file(f.name)!.async('uint8array');
      expect(bytes.length, f.name).toBe(f.bytes);
      expect(createHash('sha256').update(bytes).digest('hex'), f.name).toBe(f.sha256);
    }
    expect(out.zoneCount).toBeGreaterThan(0);
    expect(out.narrowestFeature).toBeGreaterThan(0);
    expect(stages[0]).toBe('compiling');
  });

  it('refuses a script whose phase map was never uploaded, naming it', async () => {
    await expect(exportRevision(input(SCRIPT, false), () => undefined)).rejects.toSatisfy(
      (e: unknown) => e instanceof ExportRefused && /tilt-ramp/.test(e.message),
    );
  });

  it('is reproducible: the same revision exports to the same bytes', async () => {
    const a = await exportRevision(input(SCRIPT, true), () => undefined);
    const b = await exportRevision(input(SCRIPT, true), () => undefined);
    expect(b.sha256).toBe(a.sha256);
  });
});
