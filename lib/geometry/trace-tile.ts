import type { PhaseField } from '../design/types';
import type { LayerFunctionSpec } from './boundary-function';
import { depthInDomain, exitAlong, perimeterPosition, type Domain } from './domain';
import { GeometryError } from './errors';
import { PointBuffer } from './point-buffer';
import { refineRoot, scanSegment } from './scan-segment';
import { buildSeedGrid, matchSeed, type SeedGrid } from './seed-lines';

export interface TraceSettings {
  /** µm */
  chordTolerance: number;
  /** database grid in µm */
  grid: number;
  /** µm */
  seedSpacing: number;
  anchorX: number;
  anchorY: number;
}

/** Closed loops (µm) bounding the drawn side of g inside the domain: drawn side on the left. */
export type Loop = Float64Array;

interface Chain {
  points: Float64Array;
  entry: number;
  exit: number;
}

type TraceEnd = { kind: 'closed' } | { kind: 'duplicate' } | { kind: 'exit'; tau: number };

interface SeedRef {
  horizontal: boolean;
  line: number;
  seed: number;
}

/** Largest turn of the tangent accepted in one step (radians). */
const MAX_TURN = 0.3;
/** Accepted change of |∇g| between two vertices; a faster change means a singular point ahead. */
const GRADIENT_RATIO = 1.67;
const TURN_SAMPLES = 96;
/** A step's frequency bound this many times its ends' bounds means a singular point inside its box. */
const SINGULAR_JUMP = 4;
/** Passes of one trace through one seed before it counts as going round in circles. */
const MAX_PASSES = 8;
/** Fraction of the spacing between changes along a zero line of u that one step may cover. */
const ZERO_LINE_SAFETY = 0.45;

/**
 * Follows every zone boundary (g = 0) inside a convex domain and returns the drawn regions as closed
 * loops: contours wholly inside come back as they are, contours leaving the domain are joined along
 * the domain's edge. Each step goes along the tangent, is pulled back onto g = 0 by Newton steps, and
 * is kept only when the chord stays within the chord tolerance of the curve (estimated from the
 * Newton correction and the tangent's turn), so the cost follows the number of vertices.
 */
export function traceTile(g: (x: number, y: number) => number, field: PhaseField, levels: Pick<LayerFunctionSpec, 'phaseGap' | 'zeroLineGap'>, domain: Domain, settings: TraceSettings): Loop[] {
  const { phaseGap } = levels;
  const tol = settings.chordTolerance;
  const converged = Math.min(1e-5, tol * 1e-2);
  const delta = Math.min(1e-4, settings.grid / 10);
  const minStep = settings.grid / 8;
  const turnRadius = 16 * minStep;
  const maxStep = Math.max(minStep * 16, Math.min(settings.seedSpacing, domain.box.x1 - domain.box.x0, domain.box.y1 - domain.box.y0));
  const seedTolerance = Math.min(1e-4, tol / 10);
  /** a chord within `tol` of the curve crosses a seed line within a few `tol` of the curve's crossing unless nearly parallel to it */
  const seedSlack = 4 * tol;
  const seeds: SeedGrid = buildSeedGrid(g, field, phaseGap, domain, settings.seedSpacing, settings.anchorX, settings.anchorY, seedTolerance);
  const grad = new Float64Array(2);
  /** numbers each trace, so a seed passed twice by one trace is told from one passed by another */
  let traceNumber = 0;

  const gradient = (x: number, y: number, gv: number): void => {
    grad[0] = (g(x + delta, y) - gv) / delta;
    grad[1] = (g(x, y + delta) - gv) / delta;
  };

  const fieldValue = new Float64Array(2);
  // when the field's least |u| exceeds its slope bound over the tile times the chord tolerance, no zero is near any point
  const zerosPossible = field.maxFieldGradient !== undefined && !((field.minModulus ?? 0) > 2 * Math.PI * field.maxFieldGradient(domain.box.x0, domain.box.y0, domain.box.x1, domain.box.y1) * Math.SQRT2 * tol);
  /**
   * Whether (x, y) may lie within the chord tolerance of a zero of a combined field: |u| is no more
   * than its slope bound times that distance. Along a line where u (nearly) vanishes the line is a
   * boundary only in stretches and its drawn side swaps at crossings; a step along it must not pass
   * two such changes, which would look like a smooth continuation.
   */
  const nearZeroOfField = (x: number, y: number): boolean => {
    if (!zerosPossible || !field.maxFieldGradient) return false;
    field.field(x, y, fieldValue);
    return Math.hypot(fieldValue[0], fieldValue[1]) <= 2 * Math.PI * field.maxFieldGradient(x - tol, y - tol, x + tol, y + tol) * Math.SQRT2 * tol;
  };
  /** The longest step from (x, y) along a zero line of u that passes at most one change of it (ZERO_LINE_SAFETY of the spacing). */
  const zeroLineStep = (x: number, y: number, length: number): number => {
    const frequency = field.maxSpatialFrequency(x - length, y - length, x + length, y + length);
    const step = (ZERO_LINE_SAFETY * levels.zeroLineGap) / (2 * Math.PI * frequency);
    // changes closer than a few grid steps are below the mask's resolution
    return step > 4 * minStep ? step : 4 * minStep;
  };
  /** The drawn side lies left of the boundary's orientation (tx, ty) at (x, y), whichever way the trace runs: checked at distance `offset` across it. */
  const drawnOnLeft = (x: number, y: number, tx: number, ty: number, offset: number): boolean =>
    g(x - offset * ty, y + offset * tx) > 0 && g(x + offset * ty, y - offset * tx) < 0;

  /** Marks the seeds the chord p→q passes; reports closure at the start seed or a duplicate. */
  const visitChord = (px: number, py: number, qx: number, qy: number, start: SeedRef | null, vertices: number): 'ok' | 'closed' | 'duplicate' => {
    for (let pass = 0; pass < 2; pass++) {
      const horizontal = pass === 0;
      const a = horizontal ? py : px;
      const b = horizontal ? qy : qx;
      if (a === b) continue;
      const base = horizontal ? seeds.horizontalBase : seeds.verticalBase;
      const first = horizontal ? seeds.horizontalFirst : seeds.verticalFirst;
      const lines = horizontal ? seeds.horizontal : seeds.vertical;
      const kLo = Math.ceil((Math.min(a, b) - base) / seeds.spacing);
      const kHi = Math.floor((Math.max(a, b) - base) / seeds.spacing);
      for (let k = kLo; k <= kHi; k++) {
        const line = lines[k - first];
        if (!line) continue;
        const c = line.coordinate;
        if (a < c === b < c) continue;
        const t = (c - a) / (b - a);
        const position = horizontal ? px + t * (qx - px) : py + t * (qy - py);
        const s = matchSeed(line, position, seedSlack);
        if (s < 0) continue;
        if (start && start.horizontal === horizontal && start.line === k - first && start.seed === s) {
          if (vertices >= 3) return 'closed';
          continue;
        }
        if (line.visited[s] === traceNumber && line.passes[s] < MAX_PASSES) {
          // The same trace back at its own seed: a boundary grazing the seed line crosses it several
          // times within one sample interval (the scan guarantees one boundary level per interval,
          // not one crossing, so an odd number of them shows as one), and all are credited to that
          // seed. A trace circling a closed contour comes back more often.
          line.passes[s]++;
          continue;
        }
        if (line.visited[s] !== 0) return 'duplicate';
        line.visited[s] = traceNumber;
        line.passes[s] = 1;
      }
    }
    return 'ok';
  };

  const trace = (x0: number, y0: number, dir: 1 | -1, start: SeedRef | null, out: PointBuffer): TraceEnd => {
    traceNumber++;
    let px = x0;
    let py = y0;
    let gv = g(px, py);
    gradient(px, py, gv);
    let gx = grad[0];
    let gy = grad[1];
    let gn = Math.sqrt(gx * gx + gy * gy);
    if (!(gn > 0)) throw new GeometryError(`A zone boundary has no direction at (${px.toFixed(4)}, ${py.toFixed(4)}) µm.`);
    let tx = (dir * gy) / gn;
    let ty = (-dir * gx) / gn;
    out.push(px, py);
    let L = Math.min(maxStep, 1);
    let nearZero = nearZeroOfField(px, py);
    let budget = depthInDomain(domain, px, py);
    let turns = 0;
    let rejected = 0;
    for (;;) {
      if (++rejected > 4000) throw new GeometryError(`A zone boundary could not be followed near (${px.toFixed(4)}, ${py.toFixed(4)}) µm.`);
      if (nearZero) L = Math.min(L, zeroLineStep(px, py, L));
      // Is the domain edge within reach of this step?
      let exitEdge = -1;
      let hx = 0;
      let hy = 0;
      if (L >= budget) {
        budget = depthInDomain(domain, px, py);
        if (L >= budget) {
          const e = exitAlong(domain, px, py, tx, ty);
          if (e.distance <= L) {
            exitEdge = e.edge;
            hx = px + e.distance * tx;
            hy = py + e.distance * ty;
          }
        }
      }
      let qx = px + L * tx;
      let qy = py + L * ty;
      let ok = false;
      let corr = 0;
      let ratio = 1;
      let turn = 0;
      let gqx = 0;
      let gqy = 0;
      let gqn = 0;
      let qNearZero = false;
      if (exitEdge < 0) {
        const predictedX = qx;
        const predictedY = qy;
        for (let it = 0; it < 8; it++) {
          gv = g(qx, qy);
          if (Math.abs(gv) < converged * gn) {
            ok = true;
            break;
          }
          const s = gv / (gn * gn);
          qx -= s * gx;
          qy -= s * gy;
        }
        corr = Math.sqrt((qx - predictedX) ** 2 + (qy - predictedY) ** 2);
        // q lies within |pq| of p, whose depth is at least `budget`: only a long step needs the full test.
        if (ok && (budget <= 0 || (qx - px) ** 2 + (qy - py) ** 2 >= budget * budget) && depthInDomain(domain, qx, qy) < 0) {
          // The curve leaves between p and q: finish on the edge the chord crosses.
          const chord = Math.sqrt((qx - px) ** 2 + (qy - py) ** 2);
          const e = exitAlong(domain, px, py, (qx - px) / chord, (qy - py) / chord);
          exitEdge = e.edge;
          hx = px + (e.distance * (qx - px)) / chord;
          hy = py + (e.distance * (qy - py)) / chord;
        }
      }
      if (exitEdge >= 0) {
        const end = finishOnEdge(exitEdge, hx, hy, px, py, gx, gy, gn, tx, ty);
        if (end) {
          const status = visitChord(px, py, end.x, end.y, start, out.length);
          if (status === 'duplicate') return { kind: 'duplicate' };
          out.push(end.x, end.y);
          return { kind: 'exit', tau: end.tau };
        }
        L *= 0.5;
        if (L < minStep) {
          // Within a fraction of the grid of the edge (a singular point on it, or a corner): end here.
          const u = edgeFraction(exitEdge, hx, hy);
          const status = visitChord(px, py, hx, hy, start, out.length);
          if (status === 'duplicate') return { kind: 'duplicate' };
          out.push(hx, hy);
          return { kind: 'exit', tau: perimeterPosition(domain, exitEdge, u) };
        }
        continue;
      }
      let sag = Infinity;
      if (ok) {
        gradient(qx, qy, gv);
        gqx = grad[0];
        gqy = grad[1];
        gqn = Math.sqrt(gqx * gqx + gqy * gqy);
        ratio = gqn / gn;
        const nx = (dir * gqy) / gqn;
        const ny = (-dir * gqx) / gqn;
        turn = Math.atan2(tx * ny - ty * nx, tx * nx + ty * ny);
        sag = Math.max(corr / 4, (L * Math.abs(turn)) / 8);
        const along = (qx - px) * tx + (qy - py) * ty;
        ok = gqn > 0 && sag <= tol && Math.abs(turn) <= MAX_TURN && along > 0 && ratio < GRADIENT_RATIO && ratio > 1 / GRADIENT_RATIO;
        // A step may jump across a singular point of the phase (a vortex centre) along a straight
        // zero line, with |∇g| alike at both ends. The frequency bound over the step's box then
        // dwarfs the bounds at its ends (for smooth phases they differ by a small factor), so the
        // step shrinks until the turn below chooses the boundary on the drawn side.
        ok &&= !(field.maxSpatialFrequency(Math.min(px, qx), Math.min(py, qy), Math.max(px, qx), Math.max(py, qy)) > SINGULAR_JUMP * Math.max(field.maxSpatialFrequency(px, py, px, py), field.maxSpatialFrequency(qx, qy, qx, qy)));
        if (ok) {
          qNearZero = nearZeroOfField(qx, qy);
          // Past the end of a boundary stretch of a zero line, g ≤ 0 on both sides of it and the
          // tangent there means nothing: the drawn side must still be on the left.
          if (nearZero || qNearZero) ok = drawnOnLeft(qx, qy, gqy / gqn, -gqx / gqn, Math.min(tol, 0.25 * L));
        }
      }
      if (!ok) {
        L *= sag > tol && sag < Infinity && Math.abs(turn) <= MAX_TURN ? Math.min(0.5, Math.max(0.1, 0.9 * Math.sqrt(tol / sag))) : 0.5;
        if (L < minStep) {
          // A singular point or a junction of boundaries lies just ahead: continue along the next
          // boundary met when turning around p towards the drawn side.
          if (++turns > 100_000) throw new GeometryError(`A zone boundary keeps turning near (${px.toFixed(4)}, ${py.toFixed(4)}) µm.`);
          const next = turnAround(px, py, tx, ty, dir);
          const status = visitChord(px, py, next.x, next.y, start, out.length);
          if (status !== 'ok') return status === 'closed' ? { kind: 'closed' } : { kind: 'duplicate' };
          budget -= Math.sqrt((next.x - px) ** 2 + (next.y - py) ** 2);
          px = next.x;
          py = next.y;
          out.push(px, py);
          rejected = 0;
          gv = g(px, py);
          gradient(px, py, gv);
          gx = grad[0];
          gy = grad[1];
          gn = Math.sqrt(gx * gx + gy * gy);
          if (!(gn > 0)) throw new GeometryError(`A zone boundary has no direction at (${px.toFixed(4)}, ${py.toFixed(4)}) µm.`);
          tx = (dir * gy) / gn;
          ty = (-dir * gx) / gn;
          L = turnRadius;
          nearZero = nearZeroOfField(px, py);
        }
        continue;
      }
      rejected = 0;
      const status = visitChord(px, py, qx, qy, start, out.length);
      if (status === 'closed') return { kind: 'closed' };
      if (status === 'duplicate') return { kind: 'duplicate' };
      out.push(qx, qy);
      budget -= Math.sqrt((qx - px) ** 2 + (qy - py) ** 2);
      px = qx;
      py = qy;
      nearZero = qNearZero;
      gx = gqx;
      gy = gqy;
      gn = gqn;
      tx = (dir * gy) / gn;
      ty = (-dir * gx) / gn;
      L = Math.min(maxStep, L * Math.min(2, 0.9 * Math.sqrt(tol / Math.max(sag, tol * 1e-6))));
    }
  };

  const edgeFraction = (edge: number, x: number, y: number): number => {
    const poly = domain.polygon;
    const ax = poly[2 * edge];
    const ay = poly[2 * edge + 1];
    const ex = poly[(2 * edge + 2) % poly.length] - ax;
    const ey = poly[(2 * edge + 3) % poly.length] - ay;
    return Math.max(0, Math.min(1, ((x - ax) * ex + (y - ay) * ey) / (ex * ex + ey * ey)));
  };

  /** Where the boundary meets domain edge e near (hx, hy), if the chord from p to it is within tolerance. */
  const finishOnEdge = (edge: number, hx: number, hy: number, px: number, py: number, gx: number, gy: number, gn: number, tx: number, ty: number) => {
    const poly = domain.polygon;
    const ax = poly[2 * edge];
    const ay = poly[2 * edge + 1];
    const bx = poly[(2 * edge + 2) % poly.length];
    const by = poly[(2 * edge + 3) % poly.length];
    const ex = bx - ax;
    const ey = by - ay;
    const len2 = ex * ex + ey * ey;
    let u = ((hx - ax) * ex + (hy - ay) * ey) / len2;
    const rate = gx * ex + gy * ey;
    if (rate === 0) return null;
    let done = false;
    for (let it = 0; it < 12; it++) {
      const v = g(ax + u * ex, ay + u * ey);
      if (Math.abs(v) < converged * gn) {
        done = true;
        break;
      }
      u -= v / rate;
    }
    if (!done || u < 0 || u > 1) return null;
    const x = ax + u * ex;
    const y = ay + u * ey;
    if ((x - px) * tx + (y - py) * ty <= 0) return null;
    const mid = g(0.5 * (px + x), 0.5 * (py + y));
    if (Math.abs(mid) > tol * gn) return null;
    return { x, y, tau: perimeterPosition(domain, edge, u) };
  };

  const turnAround = (px: number, py: number, tx: number, ty: number, dir: 1 | -1) => {
    const back = Math.atan2(-ty, -tx);
    const at = (a: number) => g(px + turnRadius * Math.cos(a), py + turnRadius * Math.sin(a));
    const angle = (k: number) => back - (dir * 2 * Math.PI * k) / TURN_SAMPLES;
    let k = 1;
    while (k < TURN_SAMPLES && !(at(angle(k)) > 0)) k++;
    while (k < TURN_SAMPLES && at(angle(k)) > 0) k++;
    if (k >= TURN_SAMPLES) throw new GeometryError(`A zone boundary ends at a singular point near (${px.toFixed(4)}, ${py.toFixed(4)}) µm.`);
    const a = refineRoot((s) => at(angle(s)), k - 1, at(angle(k - 1)), k, at(angle(k)), 1e-6);
    const o = angle(a);
    return { x: px + turnRadius * Math.cos(o), y: py + turnRadius * Math.sin(o) };
  };

  const n = domain.polygon.length / 2;
  /**
   * Along the domain's edge, exits and entries must alternate. Two exits in a row (or two entries)
   * mean crossings slipped between two samples: the scan keeps crossings of different boundary
   * levels apart, but a boundary grazing the edge can cross it three times within one interval and
   * show one crossing (and, within the step floor of a zero of a combined field, levels may merge).
   * Rescan that stretch 16 times finer and trace what it finds, until the edge is consistent.
   */
  const repairMissedCrossings = (found: Chain[]): void => {
    for (let round = 0; round < 64; round++) {
      const events = found.flatMap((c) => [
        { tau: c.entry, entry: true },
        { tau: c.exit, entry: false },
      ]);
      if (events.length === 0) return;
      events.sort((a, b) => a.tau - b.tau);
      let k = events.findIndex((e, i) => e.entry === events[(i + 1) % events.length].entry);
      if (k < 0) return;
      const from = events[k].tau;
      const to = events[(k + 1) % events.length].tau;
      const before = found.length;
      for (const crossing of rescanEdge(from, to)) {
        if (found.some((c) => Math.abs(c.entry - crossing.tau) < tol || Math.abs(c.exit - crossing.tau) < tol)) continue;
        const dir = crossing.entry ? 1 : -1;
        buffer.length = 0;
        const end = trace(crossing.x, crossing.y, dir, null, buffer);
        if (end.kind !== 'exit') continue;
        const points = buffer.toArray();
        if (crossing.entry) found.push({ points, entry: crossing.tau, exit: end.tau });
        else found.push({ points: reversePoints(points), entry: end.tau, exit: crossing.tau });
      }
      if (found.length === before) return;
    }
  };

  /** Crossings on the domain's edge between perimeter positions a and b (counter-clockwise), sampled finely. */
  const rescanEdge = (a: number, b: number) => {
    const out: { x: number; y: number; tau: number; entry: boolean }[] = [];
    const span = (b - a + domain.perimeter) % domain.perimeter;
    for (let e = 0; e < n; e++) {
      const e0 = domain.cumulative[e];
      const e1 = domain.cumulative[e + 1];
      const lo = (e0 - a + domain.perimeter) % domain.perimeter;
      const len = e1 - e0;
      // portion of edge e inside the span, as fractions of the edge
      const u0 = lo < span ? 0 : lo + len > domain.perimeter ? (domain.perimeter - lo) / len : 1;
      const u1 = lo < span ? Math.min(1, (span - lo) / len) : lo + len > domain.perimeter ? Math.min(1, (domain.perimeter - lo + span) / len) : 0;
      if (!(u1 > u0)) continue;
      const ax = domain.polygon[2 * e];
      const ay = domain.polygon[2 * e + 1];
      const ex = domain.polygon[(2 * e + 2) % domain.polygon.length] - ax;
      const ey = domain.polygon[(2 * e + 3) % domain.polygon.length] - ay;
      const found = scanSegment(g, field, phaseGap / 16, ax + u0 * ex, ay + u0 * ey, ax + u1 * ex, ay + u1 * ey, seedTolerance);
      for (const t of found.t) {
        const u = u0 + t * (u1 - u0);
        const x = ax + u * ex;
        const y = ay + u * ey;
        gradient(x, y, g(x, y));
        out.push({ x, y, tau: perimeterPosition(domain, e, u), entry: grad[1] * domain.nx[e] - grad[0] * domain.ny[e] > 0 });
      }
    }
    return out;
  };

  const chains: Chain[] = [];
  const loops: Loop[] = [];
  const buffer = new PointBuffer(1024);
  const backward = new PointBuffer(256);

  // Entries on the domain edge: the boundary enters with the drawn side on its left.
  for (let e = 0; e < n; e++) {
    const ax = domain.polygon[2 * e];
    const ay = domain.polygon[2 * e + 1];
    const bx = domain.polygon[(2 * e + 2) % domain.polygon.length];
    const by = domain.polygon[(2 * e + 3) % domain.polygon.length];
    const found = scanSegment(g, field, phaseGap, ax, ay, bx, by, seedTolerance);
    for (const u of found.t) {
      const x = ax + u * (bx - ax);
      const y = ay + u * (by - ay);
      gradient(x, y, g(x, y));
      if (grad[1] * domain.nx[e] - grad[0] * domain.ny[e] <= 0) continue;
      buffer.length = 0;
      const end = trace(x, y, 1, null, buffer);
      if (end.kind === 'exit') chains.push({ points: buffer.toArray(), entry: perimeterPosition(domain, e, u), exit: end.tau });
      else if (end.kind === 'closed') loops.push(buffer.toArray());
    }
  }

  // Interior seeds: closed contours, or pieces of edge-to-edge contours whose entry was not seen.
  for (const horizontal of [true, false]) {
    const lines = horizontal ? seeds.horizontal : seeds.vertical;
    lines.forEach((line, index) => {
      for (let s = 0; s < line.positions.length; s++) {
        if (line.visited[s]) continue;
        line.visited[s] = traceNumber + 1;
        line.passes[s] = 1;
        const x = horizontal ? line.positions[s] : line.coordinate;
        const y = horizontal ? line.coordinate : line.positions[s];
        const ref = { horizontal, line: index, seed: s };
        buffer.length = 0;
        const end = trace(x, y, 1, ref, buffer);
        if (end.kind === 'closed') loops.push(buffer.toArray());
        else if (end.kind === 'exit') {
          backward.length = 0;
          const back = trace(x, y, -1, ref, backward);
          if (back.kind !== 'exit') continue;
          const points = new Float64Array(2 * (backward.length + buffer.length - 1));
          for (let i = 0; i < backward.length; i++) {
            const j = backward.length - 1 - i;
            points[2 * i] = backward.data[2 * j];
            points[2 * i + 1] = backward.data[2 * j + 1];
          }
          points.set(buffer.data.subarray(2, 2 * buffer.length), 2 * backward.length);
          chains.push({ points, entry: back.tau, exit: end.tau });
        }
      }
    });
  }

  repairMissedCrossings(chains);
  loops.push(...assembleChains(withoutRepeats(chains, tol), domain, g));
  return loops.filter((l) => l.length >= 6);
}

function reversePoints(points: Float64Array): Float64Array {
  const out = new Float64Array(points.length);
  for (let i = 0, j = points.length - 2; j >= 0; i += 2, j -= 2) {
    out[i] = points[j];
    out[i + 1] = points[j + 1];
  }
  return out;
}

/**
 * A contour reached from two seeds that were not recognised as the same one comes back twice; the
 * copies enter the domain at the same place.
 */
function withoutRepeats(chains: Chain[], tolerance: number): Chain[] {
  const sorted = [...chains].sort((a, b) => a.entry - b.entry);
  return sorted.filter((c, i) => i === 0 || c.entry - sorted[i - 1].entry > tolerance || Math.abs(c.exit - sorted[i - 1].exit) > tolerance);
}

/**
 * Joins edge-to-edge contours into closed loops by walking counter-clockwise along the domain's
 * edge from each exit to the next entry; a domain with no contour reaching its edge is wholly
 * drawn or wholly empty.
 */
export function assembleChains(chains: Chain[], domain: Domain, g: (x: number, y: number) => number): Loop[] {
  const poly = domain.polygon;
  const vertexCount = poly.length / 2;
  if (chains.length === 0) {
    // The whole edge has one state; test it mid-edge, away from corners where g may only touch zero.
    const mx = 0.5 * (poly[0] + poly[2]);
    const my = 0.5 * (poly[1] + poly[3]);
    return g(mx, my) > 0 ? [poly.slice()] : [];
  }
  const order = chains.map((_, i) => i).sort((a, b) => chains[a].entry - chains[b].entry);
  const entries = order.map((i) => chains[i].entry);
  const nextChain = (tau: number): number => {
    let lo = 0;
    let hi = entries.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (entries[mid] <= tau) lo = mid + 1;
      else hi = mid;
    }
    return order[lo % entries.length];
  };
  const used = new Uint8Array(chains.length);
  const loops: Loop[] = [];
  for (let first = 0; first < chains.length; first++) {
    if (used[first]) continue;
    const out = new PointBuffer(1024);
    let current = first;
    for (;;) {
      used[current] = 1;
      const c = chains[current];
      for (let i = 0; i < c.points.length; i += 2) out.push(c.points[i], c.points[i + 1]);
      const next = nextChain(c.exit);
      const from = c.exit;
      const to = chains[next].entry;
      const span = (to - from + domain.perimeter) % domain.perimeter;
      const corners: number[] = [];
      for (let v = 0; v < vertexCount; v++) {
        const offset = (domain.cumulative[v] - from + domain.perimeter) % domain.perimeter;
        if (offset > 0 && offset < span) corners.push(v);
      }
      corners.sort((a, b) => ((domain.cumulative[a] - from + domain.perimeter) % domain.perimeter) - ((domain.cumulative[b] - from + domain.perimeter) % domain.perimeter));
      for (const v of corners) out.push(poly[2 * v], poly[2 * v + 1]);
      if (next === first) break;
      if (used[next]) throw new GeometryError('Zone boundaries meeting the edge of a tile could not be joined into closed regions.');
      current = next;
    }
    loops.push(out.toArray());
  }
  return loops;
}
