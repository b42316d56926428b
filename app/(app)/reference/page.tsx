import type { Metadata } from 'next';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Notice, PageHeader, Panel } from '@/components/ui';
import { BUILTINS, DECLARATIONS, UNITS } from '@/lib/lang';
import type { Builtin } from '@/lib/lang';
import { describeParameter, signatureOf } from '@/lib/lang/assist';
import { TryIt } from './TryIt';

export const metadata: Metadata = { title: 'Language reference' };

const SECTIONS: { category: Builtin['category']; title: string; lead: string }[] = [
  { category: 'profile', title: 'Phase profiles', lead: 'Each gives a phase field in radians that varies over the mask. Phase fields add: lens(…) + vortex(…).' },
  { category: 'combination', title: 'Combinations and multiplexing', lead: 'Several foci from one aperture: add the complex fields, or share the aperture out in sectors or stripes.' },
  { category: 'region', title: 'Regions', lead: 'Apertures and their set operations. Lengths in nm, um (µm), mm or m.' },
  { category: 'quantization', title: 'Quantization', lead: 'How the continuous phase becomes fabricated states on one or more masks.' },
  { category: 'label', title: 'Labels', lead: 'Text drawn on the mask.' },
  { category: 'math', title: 'Math functions', lead: 'Taken by position. They keep units honest: sin needs an angle or a plain number, sqrt halves the dimension.' },
  { category: 'coordinate', title: 'Coordinates', lead: 'The position on the mask, usable in any phase expression.' },
  { category: 'constant', title: 'Constants', lead: '' },
];

function example(): string {
  try {
    return readFileSync(path.join(process.cwd(), 'examples', 'two-focus-offaxis.zw'), 'utf8');
  } catch {
    return 'wavelength 405 nm\naperture circle(diameter: 460 um)\nprofile lens(focal: 1 mm)\nquantize binary(duty: 0.5)\n';
  }
}

function Entry({ b }: { b: Builtin }) {
  return (
    <article className="border-t border-hairline py-3 first:border-t-0" id={`builtin-${b.name}`}>
      <h3 className="font-mono text-sm font-medium">{signatureOf(b)}</h3>
      <p className="mt-1 text-sm">{b.description}</p>
      {b.formula ? <p className="mt-1 font-mono text-xs text-ink/80">{b.formula}</p> : null}
      {b.params.length > 0 && b.category !== 'math' ? (
        <ul className="mt-2 space-y-0.5 text-sm">
          {b.params.map((p) => (
            <li key={p.name}>
              <span className="font-mono text-xs">{describeParameter(p)}</span>
              <span className="text-ink/70"> — {p.doc}</span>
            </li>
          ))}
        </ul>
      ) : null}
      <pre className="mt-2 rounded bg-paper px-2 py-1 font-mono text-xs">{b.example}</pre>
    </article>
  );
}

export default function ReferencePage() {
  return (
    <div className="mx-auto max-w-5xl space-y-6">
      <PageHeader
        title="Language reference"
        lead="A design script states the wavelength, the aperture, the phase profile and the quantization; every number carries its unit and is checked before anything runs."
      />
      <Notice tone="warning" title="Focused light">
        A finished lens concentrates light: never look into a focus or along the axis of a lit lens, keep laser sources within their labelled class, and follow your local laser-safety rules and your laboratory&apos;s licensed practice.
      </Notice>

      <Panel title="Try it">
        <TryIt initial={example()} />
      </Panel>

      <Panel title="Script structure">
        <div className="space-y-3 text-sm">
          <p>
            One statement per line: a declaration (<span className="font-mono">keyword value</span>) or a binding (<span className="font-mono">name = value</span>). Comments start with <span className="font-mono">#</span>. Inside parentheses a statement may continue over several indented lines. Values: numbers with units, text in double quotes, points <span className="font-mono">(x, y)</span>, arithmetic <span className="font-mono">+ − * / ^</span>, comparisons, <span className="font-mono">and / or / not</span>, and <span className="font-mono">if c then a else b</span>. Calls take positional or named arguments.
          </p>
          <table className="w-full text-left text-sm">
            <thead className="text-ink/70">
              <tr>
                <th className="py-1 font-medium">Declaration</th>
                <th className="py-1 font-medium">Expects</th>
                <th className="py-1 font-medium">Meaning</th>
                <th className="py-1 font-medium">Example</th>
              </tr>
            </thead>
            <tbody>
              {DECLARATIONS.map((d) => (
                <tr key={d.keyword} className="border-t border-hairline">
                  <td className="py-1 font-mono">{d.keyword}</td>
                  <td className="py-1">{d.expects}</td>
                  <td className="py-1">
                    {d.description}
                    {d.required ? ' (required)' : ''}
                  </td>
                  <td className="py-1 font-mono text-xs">{d.example}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Panel>

      <Panel title="Units">
        <p className="mb-2 text-sm">A length needs its unit; angles and phases take rad, mrad, deg or waves (a plain number in a phase is read as radians). Everything is converted once, when the script is compiled, to µm and radians.</p>
        <table className="text-left text-sm">
          <tbody>
            {UNITS.map((u) => (
              <tr key={u.name} className="border-t border-hairline first:border-t-0">
                <td className="py-1 pr-6 font-mono">{u.name}</td>
                <td className="py-1 pr-6">{u.description}</td>
                <td className="py-1 font-mono text-xs text-ink/70">= {Number(u.factor.toPrecision(10))} {u.length ? 'µm' : 'rad'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </Panel>

      {SECTIONS.map((s) => (
        <Panel key={s.category} title={s.title}>
          {s.lead ? <p className="mb-2 text-sm text-ink/80">{s.lead}</p> : null}
          {BUILTINS.filter((b) => b.category === s.category).map((b) => (
            <Entry key={b.name} b={b} />
          ))}
        </Panel>
      ))}
    </div>
  );
}
