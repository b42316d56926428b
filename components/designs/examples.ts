/** The bundled example scripts (examples/*.zw), described by their opening comment. Server only. */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { ExampleInfo } from './ExampleStarter';

export async function listExamples(): Promise<ExampleInfo[]> {
  const folder = path.join(process.cwd(), 'examples');
  const names = (await readdir(folder).catch(() => [] as string[])).filter((n) => n.endsWith('.zw')).sort();
  return Promise.all(
    names.map(async (file) => {
      const text = await readFile(path.join(folder, file), 'utf8');
      const comments = text
        .split('\n')
        .filter((l) => l.startsWith('#'))
        .map((l) => l.replace(/^#\s?/, '').trim());
      // First comment line: the title; the next paragraph of comments: the summary.
      const [first, ...rest] = comments;
      const body = rest[0] === '' ? rest.slice(1) : rest;
      const stop = body.indexOf('');
      const summary = (stop === -1 ? body : body.slice(0, stop)).join(' ').trim();
      return { id: file.replace(/\.zw$/, ''), title: (first || file).replace(/\.$/, ''), summary };
    }),
  );
}
