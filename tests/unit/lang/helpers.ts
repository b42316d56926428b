import { compileScript } from '@/lib/lang';
import type { CompiledDesign } from '@/lib/design/types';

/** A script around one profile, with a 405 nm wavelength and a 460 µm disc unless told otherwise. */
export function script(profile: string, extra = '', aperture = 'circle(diameter: 460 um)', wavelength = '405 nm'): string {
  return `wavelength ${wavelength}\n${extra}\naperture ${aperture}\nprofile ${profile}\nquantize binary(duty: 0.5)\n`;
}

export function compiled(source: string, env?: Parameters<typeof compileScript>[1]): CompiledDesign {
  const result = compileScript(source, env);
  if (!result.ok) throw new Error(`expected the script to compile:\n${result.diagnostics.map((d) => `${d.start.line}:${d.start.column} ${d.message}`).join('\n')}`);
  return result.design;
}
