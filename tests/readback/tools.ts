import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** Debian's python, which has python3-gdspy; not whatever python3 is first on PATH. */
export const PYTHON = '/usr/bin/python3';
const here = path.dirname(new URL(import.meta.url).pathname);

export function scratchDirectory(): string {
  return mkdtempSync(path.join(tmpdir(), 'zw-readback-'));
}

export function writeScratch(directory: string, name: string, bytes: Uint8Array): string {
  const file = path.join(directory, name);
  writeFileSync(file, bytes);
  return file;
}

export function resultLine(output: string): unknown {
  const line = output.split('\n').find((l) => l.startsWith('RESULT '));
  if (!line) throw new Error(`no RESULT line in:\n${output}`);
  return JSON.parse(line.slice('RESULT '.length));
}

export interface GdspySummary {
  name: string;
  unit: number;
  precision: number;
  cells: string[];
  tops: string[];
  layers: Record<string, { polygons: number; maxVertices: number; area: number }>;
  labels: string[];
}

export function gdspySummary(gdsFile: string): GdspySummary {
  const output = execFileSync(PYTHON, [path.join(here, 'gdspy_summary.py'), gdsFile], { encoding: 'utf8', maxBuffer: 64 << 20 });
  return resultLine(output) as GdspySummary;
}

export interface KlayoutComparison {
  gdsTop: string;
  oasTop: string;
  gdsDbu: number;
  oasDbu: number;
  cells: string[];
  layers: Record<string, { gdsArea: number; oasArea: number; gdsPolygons: number; oasPolygons: number; xorEmpty: boolean }>;
  gdsTexts: string[];
  oasTexts: string[];
}

export function klayoutCompare(gdsFile: string, oasFile: string): KlayoutComparison {
  const output = execFileSync('klayout', ['-b', '-r', path.join(here, 'klayout_compare.py'), '-rd', `gds=${gdsFile}`, '-rd', `oas=${oasFile}`], {
    encoding: 'utf8',
    env: { ...process.env, QT_QPA_PLATFORM: 'offscreen' },
    maxBuffer: 64 << 20,
  });
  return resultLine(output) as KlayoutComparison;
}
