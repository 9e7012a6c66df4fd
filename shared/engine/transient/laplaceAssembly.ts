/**
 * The assembly network in the Laplace domain (physics.md §2, §3), fast for many real s.
 * With plane matrices G(s) from projected kernels (planeKernel.ts), column resistances r and
 * ladder admittances Y(s) = links + s·C, eliminating the plane flows q = (G + r)⁻¹·T_contact
 * leaves the node conductance matrix K(s) = Y(s) + Σ_planes E (G + r)⁻¹ Eᵀ (symmetric positive
 * definite), and Z(s) = K(s)⁻¹. Same network as assembly/network.ts, which builds the steady one.
 */
import type { Model } from '../../schemas/model';
import { assemblyNetwork, type AssemblyNetwork, type Plane } from '../assembly/network';
import { columnOf } from '../assembly/columns';
import { EngineInputError } from '../errors';
import { buildSpectra } from '../truncation';
import { choleskyInPlace, choleskySolve } from './cholesky';
import { buildPlaneKernel, planeMatrixAt, KERNEL_POINTS_PER_DECADE, type PlaneKernel } from './planeKernel';

/** How the planes are projected (defaults in LAPLACE_DEFAULTS). */
export interface LaplaceSettings {
  /**
   * 'half': the kernels keep half the steady truncation per axis (the level the steady doubling
   * had already converged at, so within its tolerance, 3e-5) — 4× faster; 'full': the steady truncation.
   */
  kernelModes: 'half' | 'full';
  /** β grid points per decade of the kernels. */
  perDecade: number;
}

/** Default projection settings. */
export const LAPLACE_DEFAULTS: LaplaceSettings = { kernelModes: 'half', perDecade: KERNEL_POINTS_PER_DECADE };

/** One plane ready for many s: kernel, the node each plane source touches, its column resistances. */
interface LaplacePlane {
  kernel: PlaneKernel;
  contactNode: number[];
  resistance: number[];
}

/** A model's network prepared for evaluation at many s. */
export interface LaplaceAssembly {
  steady: AssemblyNetwork;
  /** Node heat capacities (J/K). */
  capacitance: Float64Array;
  /** Links between ladder nodes: nodes linkA[k], linkB[k] joined by conductance linkG[k] (W/K). */
  linkA: Int32Array;
  linkB: Int32Array;
  linkG: Float64Array;
  planes: LaplacePlane[];
  nodeCount: number;
}

function laplacePlane(plane: Plane, net: AssemblyNetwork, up: boolean, o: LaplaceSettings): LaplacePlane {
  const { channel, sources, truncation } = plane.modes;
  const half = o.kernelModes === 'half' && truncation.m >= 16 && truncation.n >= 16;
  const spectra = half ? buildSpectra(channel, sources, truncation.m >> 1, truncation.n >> 1) : plane.modes.spectra;
  return {
    kernel: buildPlaneKernel({ channel, spectra }, o.perDecade),
    contactNode: plane.parts.map((p) => net.junctionNode[p] + (up ? net.columns[p].nodes.length - 1 : 0)),
    resistance: plane.parts.map((p) => (up ? net.columns[p].rUp! : net.columns[p].rDown)),
  };
}

/** Build the steady network (the colleague's assembly) and project its planes for transient use. */
export function prepareLaplaceAssembly(model: Model, steady: AssemblyNetwork = assemblyNetwork(model), settings: Partial<LaplaceSettings> = {}): LaplaceAssembly {
  const o = { ...LAPLACE_DEFAULTS, ...settings };
  const withC = steady.geometry.map((g) => columnOf(g, true));
  const capacitance = Float64Array.from(withC.flatMap((c) => c.nodes.map((n) => n.capacitance)));
  const links: number[][] = [];
  steady.columns.forEach((c, p) => c.links.forEach((r, k) => links.push([steady.junctionNode[p] + k, steady.junctionNode[p] + k + 1, 1 / r])));
  const linkA = Int32Array.from(links, (l) => l[0]);
  const linkB = Int32Array.from(links, (l) => l[1]);
  const linkG = Float64Array.from(links, (l) => l[2]);
  const planes = [steady.lid ? laplacePlane(steady.lid, steady, true, o) : null, laplacePlane(steady.interposer, steady, false, o)].filter((x): x is LaplacePlane => x !== null);
  return { steady, capacitance, linkA, linkB, linkG, planes, nodeCount: steady.nodes.length };
}

/**
 * Transfer matrix at s: out[j·S + c] = rise of node j per W of source c, each source being a
 * weight vector over nodes (sources[c][node], summing to 1).
 */
export function assemblyResponseAt(a: LaplaceAssembly, s: number, sources: readonly Float64Array[]): Float64Array {
  const n = a.nodeCount;
  const K = new Float64Array(n * n);
  for (let i = 0; i < n; i++) K[i * n + i] = s * a.capacitance[i];
  for (let l = 0; l < a.linkA.length; l++) {
    const p = a.linkA[l];
    const q = a.linkB[l];
    const g = a.linkG[l];
    K[p * n + p] += g;
    K[q * n + q] += g;
    K[p * n + q] -= g;
    K[q * n + p] -= g;
  }
  for (const plane of a.planes) {
    const m = plane.kernel.count;
    const D = planeMatrixAt(plane.kernel, s);
    for (let i = 0; i < m; i++) D[i * m + i] += plane.resistance[i];
    if (!choleskyInPlace(D, m)) throw new EngineInputError('model', `The plane matrix is not positive definite at s = ${s}.`);
    const e = new Float64Array(m);
    const col = new Float64Array(m);
    for (let i = 0; i < m; i++) {
      e.fill(0);
      e[i] = 1;
      choleskySolve(D, m, e, col);
      const ni = plane.contactNode[i];
      for (let j = 0; j < m; j++) K[plane.contactNode[j] * n + ni] += col[j];
    }
  }
  if (!choleskyInPlace(K, n)) throw new EngineInputError('model', `The node conductance matrix is not positive definite at s = ${s}.`);
  const S = sources.length;
  const out = new Float64Array(n * S);
  const z = new Float64Array(n);
  sources.forEach((w, c) => {
    choleskySolve(K, n, w, z);
    for (let j = 0; j < n; j++) out[j * S + c] = z[j];
  });
  return out;
}
