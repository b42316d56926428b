'use client';

import { useState } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { Button, Notice, Panel } from '@/components/ui';
import type { SimulationResult } from '@/lib/optics';
import { downloadText } from './csv';
import { axialCsv, chromaticCsv, focalMapCsv } from './curves';
import { HeatMap } from './HeatMap';

/** Distinct hues for the foci's curves, safe for colour-blind readers: ink, then Okabe–Ito blue, reddish purple and orange. */
const FOCUS_HUES = ['#14213d', '#0072b2', '#cc79a7', '#e69f00'];

const percent = (v: number) => `${(100 * v).toFixed(2)} %`;
const micro = (v: number | null, digits = 2) => (v === null || !Number.isFinite(v) ? '—' : v.toFixed(digits));

export interface FocusCheckProps {
  result: SimulationResult | null;
  /** fraction done while the simulation runs; null or absent when idle */
  progress?: number | null;
}

/** The optical check of one revision: axial scans, focal spots, efficiencies and the chromatic shift. */
export function FocusCheck({ result, progress }: FocusCheckProps) {
  const running = progress !== undefined && progress !== null && progress < 1;
  return (
    <div className="flex flex-col gap-4" data-testid="focus-check">
      <Caution />
      {running || !result ? <Progress fraction={progress ?? null} /> : null}
      {result ? <Results result={result} /> : null}
    </div>
  );
}

function Caution() {
  return (
    <Notice tone="warning" title="Caution: focused light">
      A diffractive lens concentrates the light that falls on it. Lasers and high-power LEDs can injure eyes at the focus and along the
      beam; exposure limits and classes follow IEC 60825-1. Observe foci through a screen or camera, and follow your laboratory’s
      laser-safety rules, its safety officer and local codes, which take precedence over anything shown here.
    </Notice>
  );
}

function Progress({ fraction }: { fraction: number | null }) {
  const value = fraction === null ? null : Math.round(100 * fraction);
  return (
    <div className="flex flex-col gap-1" aria-live="polite">
      <div className="h-2 w-full overflow-hidden rounded border border-hairline bg-white" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={value ?? undefined} aria-label="Optical check progress">
        <div className="h-full bg-ink transition-[width]" style={{ width: `${value ?? 0}%` }} />
      </div>
      <p className="text-xs text-ink/70">{value === null ? 'Waiting for the optical check…' : `Simulating the mask… ${value} %`}</p>
    </div>
  );
}

function Results({ result }: { result: SimulationResult }) {
  return (
    <>
      <p className="text-sm text-ink/80">
        <span className="font-medium">{methodName(result.sampling.method)}</span> of the {result.modulation} mask at λ ={' '}
        <span className="font-mono">{(result.wavelength_um * 1000).toFixed(1)} nm</span>,{' '}
        {result.illumination.kind === 'plane' ? 'plane-wave illumination' : <>point source at <span className="font-mono">{(result.illumination.distance_um / 1000).toFixed(1)} mm</span></>}. {result.sampling.note}.
      </p>
      {result.warnings.map((w) => (
        <Notice key={w} tone="warning">
          {w.charAt(0).toUpperCase() + w.slice(1)}.
        </Notice>
      ))}
      <FociTable result={result} />
      <AxialPlot result={result} />
      <Panel title="Focal spots">
        <div className="flex flex-wrap gap-6">
          {result.focalMaps.map((map) => (
            <div key={map.focusIndex} className="flex flex-col gap-2">
              <HeatMap map={map} label={`Focus ${map.focusIndex + 1}`} />
              <Button tone="quiet" onClick={() => downloadText(`focal-map-${map.focusIndex + 1}.csv`, focalMapCsv(map))}>
                Download map (CSV)
              </Button>
            </div>
          ))}
        </div>
      </Panel>
      <OrdersTable result={result} />
      <ChromaticPlot result={result} />
    </>
  );
}

function methodName(method: SimulationResult['sampling']['method']): string {
  return method === 'radial' ? 'Radial integral' : method === 'fft-2d' ? '2-D angular spectrum' : '2-D angular spectrum of a central region';
}

function FociTable({ result }: { result: SimulationResult }) {
  return (
    <Panel title="Foci">
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink/70">
            <tr className="border-b border-hairline">
              <th className="py-1 pr-4 font-medium">Focus</th>
              <th className="py-1 pr-4 font-medium">Designed x, y, z (µm)</th>
              <th className="py-1 pr-4 font-medium">Found x, y, z (µm)</th>
              <th className="py-1 pr-4 font-medium">Efficiency</th>
              <th className="py-1 pr-4 font-medium">Peak / perfect lens</th>
              <th className="py-1 pr-4 font-medium">FWHM (µm)</th>
              <th className="py-1 pr-4 font-medium">Diffraction limit (µm)</th>
              <th className="py-1 font-medium">In Airy disc</th>
            </tr>
          </thead>
          <tbody className="font-mono">
            {result.foci.map((f, i) => (
              <tr key={i} className="border-b border-hairline last:border-0">
                <td className="py-1 pr-4 font-sans">{i + 1}</td>
                <td className="py-1 pr-4">{f.designed_um.map((v) => micro(v, 1)).join(', ')}</td>
                <td className="py-1 pr-4">{f.found_um.map((v) => micro(v, 2)).join(', ')}</td>
                <td className="py-1 pr-4">{percent(f.efficiency)}</td>
                <td className="py-1 pr-4">{percent(f.peakRatio)}</td>
                <td className="py-1 pr-4">{micro(f.fwhm_um)}</td>
                <td className="py-1 pr-4">{micro(f.diffractionLimitFwhm_um)}</td>
                <td className="py-1">{percent(f.encircledEnergy)} within {micro(f.encircledRadius_um)} µm</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-2 text-xs text-ink/70">Efficiencies are fractions of the light incident on the aperture.</p>
    </Panel>
  );
}

function OrdersTable({ result }: { result: SimulationResult }) {
  return (
    <Panel title="Diffraction orders">
      <table className="w-full text-sm">
        <thead className="text-left text-xs text-ink/70">
          <tr className="border-b border-hairline">
            <th className="py-1 pr-4 font-medium">Order</th>
            <th className="py-1 pr-4 font-medium">Focus</th>
            <th className="py-1 pr-4 font-medium">Expected z (µm)</th>
            <th className="py-1 pr-4 font-medium">Found z (µm)</th>
            <th className="py-1 font-medium">Efficiency</th>
          </tr>
        </thead>
        <tbody className="font-mono">
          {result.orders.map((o) => (
            <tr key={`${o.focusIndex}:${o.order}`} className="border-b border-hairline last:border-0">
              <td className="py-1 pr-4">{o.order === 0 ? '0 (undiffracted)' : o.order < 0 ? `${o.order} (virtual)` : `+${o.order}`}</td>
              <td className="py-1 pr-4">{o.focusIndex === null ? '—' : o.focusIndex + 1}</td>
              <td className="py-1 pr-4">{micro(o.expectedZ_um, 1)}</td>
              <td className="py-1 pr-4">{micro(o.z_um, 1)}</td>
              <td className="py-1">
                {percent(o.efficiency)}
                {o.resolved ? null : <span className="font-sans text-xs text-warning"> finer than the grid resolves</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {result.orders.some((o) => !o.resolved) ? (
        <p className="mt-2 text-xs text-ink/70">Orders marked as finer than the grid have zone frequencies above the 2-D grid’s Nyquist limit; their figures are aliased.</p>
      ) : null}
    </Panel>
  );
}

function AxialPlot({ result }: { result: SimulationResult }) {
  const [logScale, setLogScale] = useState(true);
  // each axis has its own z samples (z/6 … 1.6 z of its focus), so each line carries its own points
  const lines = result.axialScans.map((scan) => ({ scan, points: scan.z_um.map((z, i) => ({ z, intensity: Math.max(scan.intensity[i], 1e-6) })) }));
  return (
    <Panel
      title="Intensity along each focus axis"
      actions={
        <div className="flex gap-2">
          <Button tone="quiet" onClick={() => setLogScale(!logScale)}>
            {logScale ? 'Linear scale' : 'Log scale'}
          </Button>
          {result.axialScans.map((scan) => (
            <Button key={scan.focusIndex} tone="quiet" onClick={() => downloadText(`axial-scan-${scan.focusIndex + 1}.csv`, axialCsv(scan))}>
              Axis {scan.focusIndex + 1} (CSV)
            </Button>
          ))}
        </div>
      }
    >
      <div className="h-72">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 8, right: 16, bottom: 24, left: 24 }}>
            <CartesianGrid stroke="#d9d6cc" strokeDasharray="2 4" />
            <XAxis dataKey="z" type="number" allowDuplicatedCategory={false} domain={['dataMin', 'dataMax']} tickFormatter={(v: number) => v.toFixed(0)} label={{ value: 'distance behind the mask z (µm)', position: 'insideBottom', offset: -12 }} />
            <YAxis width={64} scale={logScale ? 'log' : 'linear'} domain={logScale ? [1e-3, 'auto'] : [0, 'auto']} allowDataOverflow tickFormatter={(v: number) => v.toPrecision(2)} label={{ value: 'I / I incident', angle: -90, position: 'left', offset: 4 }} />
            <Tooltip formatter={(v) => (typeof v === 'number' ? v.toPrecision(4) : String(v))} labelFormatter={(z) => `z = ${Number(z).toFixed(1)} µm`} />
            <Legend verticalAlign="top" />
            {lines.map(({ scan, points }) => (
              <Line key={scan.focusIndex} data={points} dataKey="intensity" name={`axis of focus ${scan.focusIndex + 1}`} dot={false} isAnimationActive={false} stroke={FOCUS_HUES[scan.focusIndex % FOCUS_HUES.length]} strokeWidth={1} />
            ))}
            {result.orders
              .filter((o) => o.z_um !== null && o.order > 0)
              .map((o) => (
                <ReferenceLine key={`${o.focusIndex}:${o.order}`} x={o.z_um as number} stroke="#d9d6cc" label={{ value: `+${o.order}`, position: 'top', fontSize: 10 }} />
              ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </Panel>
  );
}

function ChromaticPlot({ result }: { result: SimulationResult }) {
  const c = result.chromatic;
  const rows = c.wavelength_um.map((l, i) => ({ nm: l * 1000, found: c.focus_z_um[i], law: c.expected_z_um[i] }));
  return (
    <Panel
      title={`Focus ${c.focusIndex + 1} against wavelength`}
      actions={
        <Button tone="quiet" onClick={() => downloadText('chromatic-shift.csv', chromaticCsv(c))}>
          Download (CSV)
        </Button>
      }
    >
      <div className="h-64">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 24 }}>
            <CartesianGrid stroke="#d9d6cc" strokeDasharray="2 4" />
            <XAxis dataKey="nm" type="number" domain={['dataMin', 'dataMax']} tickFormatter={(v: number) => v.toFixed(0)} label={{ value: 'wavelength (nm)', position: 'insideBottom', offset: -12 }} />
            <YAxis width={64} domain={['auto', 'auto']} tickFormatter={(v: number) => v.toFixed(0)} label={{ value: 'focus z (µm)', angle: -90, position: 'left', offset: 4 }} />
            <Tooltip formatter={(v) => (typeof v === 'number' ? `${v.toFixed(1)} µm` : String(v))} labelFormatter={(nm) => `λ = ${Number(nm).toFixed(1)} nm`} />
            <Legend verticalAlign="top" />
            <Line dataKey="found" name="simulated focus" stroke="#14213d" dot isAnimationActive={false} />
            <Line dataKey="law" name="f0·λ0/λ" stroke="#0072b2" strokeDasharray="4 3" dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-2 text-xs text-ink/70">{c.note}.</p>
    </Panel>
  );
}
