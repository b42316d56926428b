import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { fabReadme, layerMeaning, zipBundle } from '@/lib/bundle';
import type { BundleManifest } from '@/lib/bundle';

const binary = { kind: 'binary', duty: 0.5, phaseOffset: 0, modulation: 'phase', tone: 'positive', refractiveIndex: 1.5 } as const;

describe('layer meaning', () => {
  it('states a phase step of λ/(2(n − 1)) for binary phase zones', () => {
    // step height for a π phase step: d = λ / (2(n − 1)) (thin-element approximation, from memory); 405 nm, n = 1.5 → 405 nm
    const meaning = layerMeaning({ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }, binary, 0.405);
    expect(meaning.meaning).toContain('405.0 nm');
    expect(meaning.tone).toContain('retarded by π');
  });

  it('names open and chrome for amplitude tones', () => {
    const positive = layerMeaning({ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }, { ...binary, modulation: 'amplitude' }, 0.405);
    const negative = layerMeaning({ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }, { ...binary, modulation: 'amplitude', tone: 'negative' }, 0.405);
    expect(positive.tone).toContain('open (chrome removed');
    expect(negative.tone).toContain('chrome (opaque)');
  });

  it('gives mask k of a multi-level design a step of λ/(2^k(n − 1))', () => {
    // 4 levels at 405 nm, n = 1.47: mask 2 step = 0.405 / (4 × 0.47) µm = 215.4 nm
    const meaning = layerMeaning({ layer: 2, datatype: 0, name: 'level 2', purpose: 'level', levelIndex: 2 }, { kind: 'multilevel', bits: 2, phaseOffset: 0, refractiveIndex: 1.47 }, 0.405);
    expect(meaning.meaning).toContain('215.4 nm');
  });
});

const manifest: Omit<BundleManifest, 'files'> = {
  format: 'zonewright-bundle/1',
  design: { name: 'demo', id: null },
  revision: { number: 3, id: null },
  createdAt: '2026-12-01T22:00:00.000Z',
  engineVersion: 'test',
  source: 'wavelength 405 nm',
  wavelength: { micrometres: 0.405, nanometres: 405 },
  units: { lengthsIn: 'micrometres', userUnitMetres: 1e-6, databaseUnitMetres: 1e-9, databaseGridMicrometres: 0.001 },
  settings: { chordToleranceMicrometres: 0.005, maxVerticesPerPolygon: 4095, minimumFeatureMicrometres: 1 },
  quantization: binary,
  layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones', meaning: 'binary phase zones', tone: 'positive' }],
  foci: [{ x: 0, y: 0, z: 1000, weight: 1 }],
  exposureMatrix: null,
  topCell: 'DEMO_R3',
  report: {},
};

describe('README for fab staff', () => {
  const text = fabReadme(manifest, [{ name: 'mask.gds', bytes: 1234, sha256: 'ab'.repeat(32) }], ['zones: 65']);

  it('lists the files with checksums, units, the layer map with polarity and the process minimum', () => {
    expect(text).toContain(`mask.gds                 1234 bytes  sha256 ${'ab'.repeat(32)}`);
    expect(text).toContain('database units of 0.001 µm');
    expect(text).toContain('1/0     zones (zones): binary phase zones');
    expect(text).toContain('polarity: positive');
    expect(text).toContain('Process minimum feature: 1 µm');
    expect(text).toContain('zones: 65');
  });

  it('carries the usual cautions and defers to local codes', () => {
    expect(text).toMatch(/chrome etchants and solvents are hazardous/);
    expect(text).toMatch(/Never look into a focused beam/);
    expect(text).toMatch(/do not replace local codes/);
  });
});

describe('zip bundle', () => {
  const entries = [
    { name: 'README.txt', data: 'hello fab\n' },
    { name: 'mask.gds', data: new Uint8Array(5000).map((_, i) => i % 251) },
  ];

  it("opens with Python's zipfile, every entry intact, dated in UTC", () => {
    // Python's zipfile module (an outside zip reader) checks the CRC of every entry in testzip()
    const zip = zipBundle(entries, new Date(Date.UTC(2026, 11, 1, 12, 34, 56)));
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'zw-zip-')), 'b.zip');
    writeFileSync(file, zip);
    const out = execFileSync(
      '/usr/bin/python3',
      ['-c', 'import sys, zipfile, hashlib; z = zipfile.ZipFile(sys.argv[1]); print(z.testzip()); print(" ".join(i.filename + ":" + hashlib.sha256(z.read(i)).hexdigest() + ":" + "-".join(map(str, i.date_time)) for i in z.infolist()))', file],
      { encoding: 'utf8' },
    ).trim().split('\n');
    expect(out[0]).toBe('None');
    const sha = (data: Uint8Array | string) => createHash('sha256').update(data).digest('hex');
    // DOS times keep even seconds: 12:34:56 stays 12:34:56
    expect(out[1]).toBe(`README.txt:${sha(entries[0].data)}:2026-12-1-12-34-56 mask.gds:${sha(entries[1].data)}:2026-12-1-12-34-56`);
  });

  it('gives the same bytes for the same entries and date', () => {
    const date = new Date(Date.UTC(2026, 11, 1, 12));
    expect(Buffer.from(zipBundle(entries, date))).toEqual(Buffer.from(zipBundle(entries, date)));
  });
});
