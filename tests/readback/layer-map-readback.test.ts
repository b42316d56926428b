/**
 * A design's layer map reaches the files: the worker's exporter with zones on 5/2 and labels on 63/1
 * writes a GDSII file in which gdspy (python3-gdspy, a general-purpose GDSII reader) finds exactly
 * those layers, and the manifest names them.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { exportRevision } from '@/lib/jobs/export-revision';
import { gdspySummary, scratchDirectory, writeScratch } from './tools';

const source = readFileSync(path.resolve(__dirname, '../../examples/single-focus-405.zw'), 'utf8');

describe('layer map', () => {
  it('puts zones and labels on the layers the design names', async () => {
    const out = await exportRevision(
      {
        source,
        processProfile: {
          chordTolerance: 0.02,
          layerMap: [
            { purpose: 'zones', layer: 5, datatype: 2, name: 'zones' },
            { purpose: 'label', layer: 63, datatype: 1, name: 'label' },
          ],
        },
        phaseMaps: [],
        designId: '00000000-0000-0000-0000-000000000011',
        designName: 'Layer map test',
        revisionId: '00000000-0000-0000-0000-000000000012',
        revisionNumber: 1,
        savedAt: '2026-12-01T12:00:00.000Z',
      },
      () => undefined,
    );
    const zip = await JSZip.loadAsync(out.zip);
    const gds = await zip.file('mask.gds')!.async('uint8array');
    const summary = gdspySummary(writeScratch(scratchDirectory(), 'mask.gds', gds));
    // gdspy keys layers as "layer/datatype" in our summary script
    expect(Object.keys(summary.layers).sort()).toEqual(['5/2', '63/1']);
    expect(summary.layers['5/2'].polygons).toBeGreaterThan(0);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string')) as { layers: { layer: number; datatype: number; purpose: string }[] };
    expect(manifest.layers.map((l) => `${l.purpose} ${l.layer}/${l.datatype}`).sort()).toEqual(['label 63/1', 'zones 5/2']);
  });
});
