/**
 * Own numerical reference (FV) of a whole assembly: steady 3-D conduction in the real geometry that the
 * compact model (shared/engine/assembly) idealises — substrate (its own footprint, board side cooled),
 * C4 under the interposer only, interposer, bump/underfill layer under each part only, each die (and each
 * DRAM tier and bond of a memory stack) as a 3-D block, TIM1 on each part, and the lid (its own footprint,
 * top cooled). The gaps between parts, the interposer top beside the parts, the lid underside between
 * parts and the substrate top beyond the interposer are adiabatic (void cells) unless a fill material is
 * given. Sources are uniform fluxes on each node's plane — the die's bump-side (active) face, where the
 * compact model puts its nodes (shared/engine/assembly/columns.ts) — and the probes are mean temperatures
 * over the same faces.
 *
 * Method: cell-centred finite volumes on a tensor grid whose lines include every block edge, two-point
 * fluxes with harmonic (series) half-cell conductances (Patankar, Numerical Heat Transfer and Fluid Flow,
 * 1980), as tests/shared/engine/fv.ts. A face source between two cells is a face node eliminated exactly:
 * it splits its power between the two cells in proportion to their half-cell conductances, and its
 * temperature is recovered afterwards. Solved by preconditioned conjugate gradients (Saad, Iterative Methods
 * for Sparse Linear Systems, 2003, alg. 9.1) with a z-line block-Jacobi preconditioner (one tridiagonal
 * Thomas solve per grid column): the thin, stiff layers make the z couplings dominate, which plain Jacobi
 * handles poorly.
 */
import { pcg } from './fv';
import { modelSchema, type Model, type ModelInput, type Part, type PartLoad } from '../../../shared/schemas/model';
import { lidOrigin, partGeometries } from '../../../shared/engine/assembly/geometry';

/** An axis-aligned solid box (m); later boxes override earlier ones where they overlap. */
export interface FvBox {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  z0: number;
  z1: number;
  kxy: number;
  kz: number;
  label: string;
}

/** A rectangle on a horizontal plane z (m). */
export interface FvFace {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  z: number;
}

/** Grid control: largest cell sizes (m) before refinement, and the refinement factor (cells per interval × refine). */
export interface FvGridOptions {
  maxDx: number;
  maxDz: number;
  refine: number;
}

export interface FvAssemblyProblem {
  boxes: FvBox[];
  /** Extra grid lines (m) beyond the box edges (e.g. source edges). */
  extraLines?: { x?: number[]; y?: number[]; z?: number[] };
  /** Convection on the lowest face (z = min) of solid cells and on the highest face (z = max). */
  bottom: { h: number; fluid: number };
  top: { h: number; fluid: number };
  /** Uniform-flux sources on faces; their planes and edges must be grid lines. */
  sources: (FvFace & { power: number })[];
  /** Faces whose mean temperature is wanted. */
  probes: FvFace[];
}

/** Heat split and grid figures of one FV solve. */
export interface FvRun {
  /** Heat to the top fluid and to the bottom fluid (W), and the total source power. */
  toTop: number;
  toBottom: number;
  power: number;
  cells: number;
  grid: { nx: number; ny: number; nz: number };
  iterations: number;
}

export interface FvAssemblyResult extends FvRun {
  /** Mean temperature of each probe face (°C). */
  probe: number[];
  residual: number;
}

/** Grid lines: sorted unique edges, each interval cut into ceil(length / maxStep) · refine equal cells. */
export function gridLines(edges: number[], maxStep: number, refine: number): number[] {
  const tol = 1e-12;
  const sorted = [...edges].sort((a, b) => a - b).filter((v, i, a) => i === 0 || v - a[i - 1] > tol);
  const out = [sorted[0]];
  for (let i = 1; i < sorted.length; i++) {
    const a = sorted[i - 1];
    const len = sorted[i] - a;
    const cells = Math.max(1, Math.ceil(len / maxStep - 1e-9)) * refine;
    for (let c = 1; c <= cells; c++) out.push(c === cells ? sorted[i] : a + (len * c) / cells);
  }
  return out;
}

/** Index of grid line v (throws when v is not one). */
function lineIndex(lines: number[], v: number, what: string): number {
  const scale = lines[lines.length - 1] - lines[0];
  const i = lines.findIndex((l) => Math.abs(l - v) <= 1e-9 * scale);
  if (i < 0) throw new Error(`fvAssembly: ${what} ${v} is not on a grid line`);
  return i;
}

/** Cell index range [i0, i1) whose centres lie inside [a, b]. */
function cellRange(lines: number[], a: number, b: number): [number, number] {
  let i0 = lines.length - 1;
  let i1 = 0;
  for (let i = 0; i < lines.length - 1; i++) {
    const c = (lines[i] + lines[i + 1]) / 2;
    if (c > a && c < b) {
      i0 = Math.min(i0, i);
      i1 = Math.max(i1, i + 1);
    }
  }
  return i1 > i0 ? [i0, i1] : [0, 0];
}

/** Solve a problem on the grid that `grid` sets. */
export function solveFvAssembly(p: FvAssemblyProblem, grid: FvGridOptions, tolerance = 1e-10, maxIterations = 20000): FvAssemblyResult {
  const edges = (lo: 'x0' | 'y0' | 'z0', hi: 'x1' | 'y1' | 'z1', extra: number[] = []): number[] => [...p.boxes.flatMap((b) => [b[lo], b[hi]]), ...extra];
  const sourceEdges = (a: 'x0' | 'y0', b: 'x1' | 'y1'): number[] => [...p.sources, ...p.probes].flatMap((s) => [s[a], s[b]]);
  const xs = gridLines(edges('x0', 'x1', [...(p.extraLines?.x ?? []), ...sourceEdges('x0', 'x1')]), grid.maxDx, grid.refine);
  const ys = gridLines(edges('y0', 'y1', [...(p.extraLines?.y ?? []), ...sourceEdges('y0', 'y1')]), grid.maxDx, grid.refine);
  const zs = gridLines(edges('z0', 'z1', [...(p.extraLines?.z ?? []), ...p.sources.map((s) => s.z), ...p.probes.map((s) => s.z)]), grid.maxDz, grid.refine);
  const nx = xs.length - 1;
  const ny = ys.length - 1;
  const nz = zs.length - 1;
  const plane = nx * ny;
  const n = plane * nz;
  const dx = Float64Array.from({ length: nx }, (_, i) => xs[i + 1] - xs[i]);
  const dy = Float64Array.from({ length: ny }, (_, j) => ys[j + 1] - ys[j]);
  const dz = Float64Array.from({ length: nz }, (_, k) => zs[k + 1] - zs[k]);

  // Cell conductivities (0 = void).
  const kxy = new Float64Array(n);
  const kz = new Float64Array(n);
  for (const b of p.boxes) {
    const [i0, i1] = cellRange(xs, b.x0, b.x1);
    const [j0, j1] = cellRange(ys, b.y0, b.y1);
    const [k0, k1] = cellRange(zs, b.z0, b.z1);
    for (let k = k0; k < k1; k++) {
      for (let j = j0; j < j1; j++) {
        for (let i = i0; i < i1; i++) {
          const c = k * plane + j * nx + i;
          kxy[c] = b.kxy;
          kz[c] = b.kz;
        }
      }
    }
  }

  // Conductances to the +x, +y, +z neighbour (W/K), boundary conductances, diagonal.
  const gx = new Float64Array(n);
  const gy = new Float64Array(n);
  const gz = new Float64Array(n);
  const gBottom = new Float64Array(plane);
  const gTop = new Float64Array(plane);
  const diag = new Float64Array(n);
  const half = (d: number, k: number): number => d / (2 * k);
  for (let k = 0; k < nz; k++) {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = k * plane + j * nx + i;
        if (kxy[c] === 0) continue;
        if (i < nx - 1 && kxy[c + 1] > 0) gx[c] = (dy[j] * dz[k]) / (half(dx[i], kxy[c]) + half(dx[i + 1], kxy[c + 1]));
        if (j < ny - 1 && kxy[c + nx] > 0) gy[c] = (dx[i] * dz[k]) / (half(dy[j], kxy[c]) + half(dy[j + 1], kxy[c + nx]));
        if (k < nz - 1 && kz[c + plane] > 0) gz[c] = (dx[i] * dy[j]) / (half(dz[k], kz[c]) + half(dz[k + 1], kz[c + plane]));
      }
    }
  }
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const a = dx[i] * dy[j];
      const cb = j * nx + i;
      const ct = (nz - 1) * plane + cb;
      if (kz[cb] > 0 && p.bottom.h > 0) gBottom[cb] = a / (half(dz[0], kz[cb]) + 1 / p.bottom.h);
      if (kz[ct] > 0 && p.top.h > 0) gTop[cb] = a / (half(dz[nz - 1], kz[ct]) + 1 / p.top.h);
    }
  }
  for (let c = 0; c < n; c++) {
    if (kxy[c] === 0) {
      diag[c] = 1; // void: decoupled, T = 0, never read
      continue;
    }
    let d = gx[c] + gy[c] + gz[c];
    if (c % nx > 0) d += gx[c - 1];
    if (Math.floor(c / nx) % ny > 0) d += gy[c - nx];
    if (c >= plane) d += gz[c - plane];
    diag[c] = d;
  }
  const b = new Float64Array(n);
  for (let c = 0; c < plane; c++) {
    diag[c] += gBottom[c];
    b[c] += gBottom[c] * p.bottom.fluid;
    diag[(nz - 1) * plane + c] += gTop[c];
    b[(nz - 1) * plane + c] += gTop[c] * p.top.fluid;
  }

  // Face sources: the face node between cell below (g1) and above (g2) splits Q as g1 : g2.
  type FaceCell = { below: number; above: number; g1: number; g2: number; area: number };
  const faceCells = (f: FvFace): FaceCell[] => {
    const kf = lineIndex(zs, f.z, 'source/probe plane');
    const [i0, i1] = cellRange(xs, f.x0, f.x1);
    const [j0, j1] = cellRange(ys, f.y0, f.y1);
    lineIndex(xs, f.x0, 'face edge');
    lineIndex(xs, f.x1, 'face edge');
    lineIndex(ys, f.y0, 'face edge');
    lineIndex(ys, f.y1, 'face edge');
    const out: FaceCell[] = [];
    for (let j = j0; j < j1; j++) {
      for (let i = i0; i < i1; i++) {
        const area = dx[i] * dy[j];
        const below = kf > 0 ? (kf - 1) * plane + j * nx + i : -1;
        const above = kf < nz ? kf * plane + j * nx + i : -1;
        const g1 = below >= 0 && kz[below] > 0 ? area / half(dz[kf - 1], kz[below]) : 0;
        const g2 = above >= 0 && kz[above] > 0 ? area / half(dz[kf], kz[above]) : 0;
        if (g1 + g2 === 0) throw new Error('fvAssembly: a source/probe face touches no solid');
        out.push({ below, above, g1, g2, area });
      }
    }
    return out;
  };
  let power = 0;
  for (const s of p.sources) {
    const cells = faceCells(s);
    const total = cells.reduce((a, f) => a + f.area, 0);
    for (const f of cells) {
      const q = (s.power * f.area) / total;
      if (f.g1 > 0) b[f.below] += (q * f.g1) / (f.g1 + f.g2);
      if (f.g2 > 0) b[f.above] += (q * f.g2) / (f.g1 + f.g2);
    }
    power += s.power;
  }

  const apply = (v: Float64Array, out: Float64Array): void => {
    for (let c = 0; c < n; c++) {
      let s = diag[c] * v[c];
      if (gx[c] !== 0) s -= gx[c] * v[c + 1];
      if (gy[c] !== 0) s -= gy[c] * v[c + nx];
      if (gz[c] !== 0) s -= gz[c] * v[c + plane];
      out[c] = s;
    }
    for (let c = 0; c < n; c++) {
      const w = v[c];
      if (gx[c] !== 0) out[c + 1] -= gx[c] * w;
      if (gy[c] !== 0) out[c + nx] -= gy[c] * w;
      if (gz[c] !== 0) out[c + plane] -= gz[c] * w;
    }
  };
  // z-line preconditioner: Thomas factors of each column's tridiagonal block.
  const cPrime = new Float64Array(n);
  const invDen = new Float64Array(n);
  for (let col = 0; col < plane; col++) {
    let prevC = 0;
    for (let k = 0; k < nz; k++) {
      const c = k * plane + col;
      const lower = k > 0 ? -gz[c - plane] : 0;
      const den = diag[c] - lower * prevC;
      invDen[c] = 1 / den;
      prevC = k < nz - 1 ? -gz[c] / den : 0;
      cPrime[c] = prevC;
    }
  }
  const precondition = (r: Float64Array, z: Float64Array): void => {
    for (let col = 0; col < plane; col++) {
      let prev = 0;
      for (let k = 0; k < nz; k++) {
        const c = k * plane + col;
        const lower = k > 0 ? -gz[c - plane] : 0;
        prev = (r[c] - lower * prev) * invDen[c];
        z[c] = prev;
      }
      for (let k = nz - 2; k >= 0; k--) {
        const c = k * plane + col;
        z[c] -= cPrime[c] * z[c + plane];
      }
    }
  };
  const { x, iterations, residual } = pcg(apply, precondition, b, tolerance, maxIterations, 'solveFvAssembly');

  const probe = p.probes.map((f) => {
    let sum = 0;
    let area = 0;
    for (const fc of faceCells(f)) {
      // Face node temperature, with this face's own injected source flux (if any) included.
      let q = 0;
      for (const s of p.sources) {
        if (Math.abs(s.z - f.z) < 1e-15 && overlaps(s, fc, f)) q += (s.power * fc.area) / ((s.x1 - s.x0) * (s.y1 - s.y0));
      }
      const t1 = fc.g1 > 0 ? x[fc.below] : 0;
      const t2 = fc.g2 > 0 ? x[fc.above] : 0;
      sum += (fc.area * (fc.g1 * t1 + fc.g2 * t2 + q)) / (fc.g1 + fc.g2);
      area += fc.area;
    }
    return sum / area;
  });
  // The cell of a face is inside the source rectangle when its centre is.
  function overlaps(s: FvFace, fc: FaceCell, _f: FvFace): boolean {
    const c = fc.above >= 0 ? fc.above : fc.below;
    const i = c % nx;
    const j = Math.floor(c / nx) % ny;
    const cx = (xs[i] + xs[i + 1]) / 2;
    const cy = (ys[j] + ys[j + 1]) / 2;
    return cx > s.x0 && cx < s.x1 && cy > s.y0 && cy < s.y1;
  }
  let toTop = 0;
  let toBottom = 0;
  for (let c = 0; c < plane; c++) {
    toBottom += gBottom[c] * (x[c] - p.bottom.fluid);
    toTop += gTop[c] * (x[(nz - 1) * plane + c] - p.top.fluid);
  }
  return { probe, toTop, toBottom, power, cells: n, grid: { nx, ny, nz }, iterations, residual };
}

/** One node of a part as the FV sees it: its plane (the active face of its die) and footprint. */
export interface FvNode {
  part: number;
  tier: number;
  face: FvFace;
}

/** Options of the model → FV translation. */
export interface FvModelOptions {
  /** Fill between interposer top and lid underside over the interposer (e.g. mold); null/absent = adiabatic gaps. */
  fill?: { kxy: number; kz: number } | null;
  /** Diagnostic: false makes every part a bundle of 1-D filaments (in-plane k of its layers ≈ 0). */
  lateralInParts?: boolean;
}

/**
 * The FV problem of a model (steady, no power maps, no contact resistances, no Joule heat): the substrate
 * is centred on the interposer (the model gives no substrate offset), the lid sits on the parts' TIM1
 * (every part that touches the lid must have the same height). Node powers per part: [junction, tier 1 …].
 */
export function fvFromModel(model: Model, powers: number[][], options: FvModelOptions = {}): { problem: FvAssemblyProblem; nodes: FvNode[] } {
  const { interposer, c4, substrate, lid, cooling } = model.stack;
  const all = [...interposer.layers, c4, ...substrate.layers, ...lid.layers, ...model.parts.flatMap((p) => [p.die, p.bumps, p.tim1, p.memory?.tier, p.memory?.bond])];
  if (all.some((l) => l && l.contactResistance)) throw new Error('fvFromModel: contact resistances are not modelled');
  const boxes: FvBox[] = [];
  const ix0 = 0;
  const ix1 = interposer.width;
  const iy0 = 0;
  const iy1 = interposer.height;
  const sx0 = (interposer.width - substrate.width) / 2;
  const sy0 = (interposer.height - substrate.height) / 2;
  // Substrate layers and interposer layers are listed from the top down.
  let z = 0;
  for (const l of [...substrate.layers].reverse()) {
    boxes.push({ x0: sx0, x1: sx0 + substrate.width, y0: sy0, y1: sy0 + substrate.height, z0: z, z1: z + l.thickness, kxy: l.kxy, kz: l.kz, label: 'substrate' });
    z += l.thickness;
  }
  boxes.push({ x0: ix0, x1: ix1, y0: iy0, y1: iy1, z0: z, z1: z + c4.thickness, kxy: c4.kxy, kz: c4.kz, label: 'c4' });
  z += c4.thickness;
  for (const l of [...interposer.layers].reverse()) {
    boxes.push({ x0: ix0, x1: ix1, y0: iy0, y1: iy1, z0: z, z1: z + l.thickness, kxy: l.kxy, kz: l.kz, label: 'interposer' });
    z += l.thickness;
  }
  const zTop = z;
  const geometry = partGeometries(model);
  const heights = model.parts.map((p) => p.bumps.thickness + p.die.thickness + (p.memory ? p.memory.tiers * (p.memory.tier.thickness + p.memory.bond.thickness) : 0) + (p.tim1?.thickness ?? 0));
  const lidHeights = model.parts.flatMap((p, i) => (p.tim1 ? [heights[i]] : []));
  if (!lidHeights.length) throw new Error('fvFromModel: no part touches the lid');
  const zLid = zTop + Math.max(...lidHeights);
  if (lidHeights.some((h) => Math.abs(zTop + h - zLid) > 1e-9)) throw new Error('fvFromModel: parts touching the lid must have equal heights');
  if (options.fill) boxes.push({ x0: ix0, x1: ix1, y0: iy0, y1: iy1, z0: zTop, z1: zLid, ...options.fill, label: 'fill' });
  const nodes: FvNode[] = [];
  const sources: FvAssemblyProblem['sources'] = [];
  geometry.forEach((g, p) => {
    const f = g.footprint;
    const rect = { x0: f.x - f.width / 2, x1: f.x + f.width / 2, y0: f.y - f.height / 2, y1: f.y + f.height / 2 };
    const part = g.part;
    let zz = zTop;
    const add = (l: { thickness: number; kxy: number; kz: number }, label: string): void => {
      const kxy = options.lateralInParts === false ? l.kz * 1e-9 : l.kxy;
      boxes.push({ ...rect, z0: zz, z1: zz + l.thickness, kxy, kz: l.kz, label });
      zz += l.thickness;
    };
    add(part.bumps, `${part.id} bumps`);
    const node = (tier: number): void => {
      const face = { ...rect, z: zz };
      nodes.push({ part: p, tier, face });
      const w = powers[p]?.[tier] ?? 0;
      if (w > 0) sources.push({ ...face, power: w });
    };
    node(0);
    add(part.die, `${part.id} die`);
    if (part.memory) {
      for (let k = 1; k <= part.memory.tiers; k++) {
        add(part.memory.bond, `${part.id} bond ${k}`);
        node(k);
        add(part.memory.tier, `${part.id} tier ${k}`);
      }
    }
    if (part.tim1) add(part.tim1, `${part.id} tim1`);
  });
  const o = lidOrigin(model);
  let zl = zLid;
  for (const l of lid.layers) {
    boxes.push({ x0: o.x, x1: o.x + lid.width, y0: o.y, y1: o.y + lid.height, z0: zl, z1: zl + l.thickness, kxy: l.kxy, kz: l.kz, label: 'lid' });
    zl += l.thickness;
  }
  const problem: FvAssemblyProblem = {
    boxes,
    bottom: { h: cooling.bottom.h, fluid: cooling.bottom.fluidTemperature },
    top: { h: cooling.top.h, fluid: cooling.top.fluidTemperature },
    sources,
    probes: nodes.map((nd) => nd.face),
  };
  return { problem, nodes };
}

/** Node powers [junction, tier 1 …] of each part from a scenario's loads (power maps and currents refused). */
export function scenarioPowers(model: Model, scenarioIndex = 0): number[][] {
  const loads = model.scenarios[scenarioIndex].loads;
  return model.parts.map((part) => {
    const load: PartLoad = loads[part.id] ?? { power: 0 };
    if (load.map || load.current) throw new Error('scenarioPowers: power maps and currents are not modelled by the FV reference');
    return [load.power, ...(load.tiers ?? [])];
  });
}

const MM = 1e-3;
const UM = 1e-6;

/**
 * The check assembly (SI): a 20 × 12 mm Si interposer (100 µm) on a 28 × 20 mm organic substrate (1.2 mm)
 * under a 22 × 14 mm copper lid (1.5 mm); a compute die 8 × 9 mm, a memory stack 5 × 6 mm (base die and
 * 4 DRAM tiers with bond layers) and an I/O die 4 × 4 mm, all 0.72 mm tall with 25 µm bumps and 50 µm
 * TIM1; gaps 1 mm and 0.75 mm. Cold plate h 5,000 W/m²K to 40 °C on the lid, board side h 200 W/m²K to
 * 35 °C. Materials as the demo (shared/demo/materials.ts: Si and Cu from Incropera & DeWitt Table A.1,
 * the package layers common practice). One scenario: compute 60 W, memory base 2 W + 4 × 0.5 W, I/O 8 W.
 */
export function fvCheckModel(): Model {
  const si = (t: number) => ({ thickness: t, kxy: 148, kz: 148 });
  const bumps = { thickness: 25 * UM, kxy: 1.5, kz: 5 };
  const tim1 = { thickness: 50 * UM, kxy: 3, kz: 3 };
  const at = (id: string, kind: Part['kind'], x0: number, y0: number, w: number, h: number, extra: Partial<Part> = {}): Part => ({
    id,
    name: id,
    kind,
    x: (x0 + w / 2) * MM,
    y: (y0 + h / 2) * MM,
    width: w * MM,
    height: h * MM,
    rotation: 0,
    die: si(720 * UM),
    tim1,
    bumps,
    limits: { junction: 105 },
    ...extra,
  });
  const input: ModelInput = {
    stack: {
      interposer: { width: 20 * MM, height: 12 * MM, layers: [si(100 * UM)] },
      c4: { thickness: 80 * UM, kxy: 0.6, kz: 2 },
      substrate: { width: 28 * MM, height: 20 * MM, layers: [{ thickness: 1.2 * MM, kxy: 25, kz: 1 }] },
      lid: { width: 22 * MM, height: 14 * MM, offsetX: 0, offsetY: 0, layers: [{ thickness: 1.5 * MM, kxy: 401, kz: 401 }] },
      cooling: { top: { h: 5000, fluidTemperature: 40 }, bottom: { h: 200, fluidTemperature: 35 } },
    },
    parts: [
      at('cpu', 'compute', 1, 1.5, 8, 9),
      at('mem', 'memory', 10, 5.5, 5, 6, {
        die: si(200 * UM),
        memory: { tiers: 4, tier: si(100 * UM), bond: { thickness: 30 * UM, kxy: 0.8, kz: 2 } },
        limits: { junction: 85, extended: 95 },
      }),
      at('io', 'io', 10.5, 0.75, 4, 4),
    ],
    scenarios: [{ id: 'run', name: 'Run', loads: { cpu: { power: 60 }, mem: { power: 2, tiers: [0.5, 0.5, 0.5, 0.5] }, io: { power: 8 } } }],
  };
  return modelSchema.parse(input);
}

/** FV figures of one grid: scenario temperatures of every node, the junction influence matrix, heat split. */
export interface FvFigures extends FvRun {
  /** Mean temperature of each node (°C), in `nodes` order (part by part, junction first). */
  nodeT: number[];
  /** R[i][j]: mean junction rise of part i per W at part j's junction, fluids at 0 (K/W). */
  R: number[][] | null;
}

/** Solve a model's first scenario on one grid, and (when withInfluence) its junction influence matrix. */
export function fvFigures(model: Model, grid: FvGridOptions, options: FvModelOptions & { withInfluence?: boolean } = {}): FvFigures & { nodes: FvNode[] } {
  const { problem, nodes } = fvFromModel(model, scenarioPowers(model), options);
  const run = solveFvAssembly(problem, grid, 1e-9);
  let R: number[][] | null = null;
  if (options.withInfluence) {
    const junction = model.parts.map((_, p) => nodes.findIndex((nd) => nd.part === p && nd.tier === 0));
    R = model.parts.map(() => model.parts.map(() => 0));
    model.parts.forEach((_, j) => {
      const unit = fvFromModel(
        model,
        model.parts.map((__, p) => (p === j ? [1] : [0])),
        options,
      ).problem;
      const r = solveFvAssembly({ ...unit, top: { ...unit.top, fluid: 0 }, bottom: { ...unit.bottom, fluid: 0 } }, grid, 1e-9);
      junction.forEach((node, i) => (R![i][j] = r.probe[node]));
    });
  }
  return { nodes, nodeT: run.probe, R, toTop: run.toTop, toBottom: run.toBottom, power: run.power, cells: run.cells, grid: run.grid, iterations: run.iterations };
}
