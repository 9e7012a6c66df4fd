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
import { luFactor, luSolve } from '../linear';
import { buildPlaneKernel, planeMatrixAt, type PlaneKernel } from './planeKernel';

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
  /** Links between ladder nodes: [node a, node b, resistance K/W]. */
  links: [number, number, number][];
  planes: LaplacePlane[];
  nodeCount: number;
}

function laplacePlane(plane: Plane, net: AssemblyNetwork, up: boolean): LaplacePlane {
  return {
    kernel: buildPlaneKernel(plane.modes),
    contactNode: plane.parts.map((p) => net.junctionNode[p] + (up ? net.columns[p].nodes.length - 1 : 0)),
    resistance: plane.parts.map((p) => (up ? net.columns[p].rUp! : net.columns[p].rDown)),
  };
}

/** Build the steady network (the colleague's assembly) and project its planes for transient use. */
export function prepareLaplaceAssembly(model: Model, steady: AssemblyNetwork = assemblyNetwork(model)): LaplaceAssembly {
  const withC = steady.geometry.map((g) => columnOf(g, true));
  const capacitance = Float64Array.from(withC.flatMap((c) => c.nodes.map((n) => n.capacitance)));
  const links: [number, number, number][] = [];
  steady.columns.forEach((c, p) => c.links.forEach((r, k) => links.push([steady.junctionNode[p] + k, steady.junctionNode[p] + k + 1, r])));
  const planes = [steady.lid ? laplacePlane(steady.lid, steady, true) : null, laplacePlane(steady.interposer, steady, false)].filter((x): x is LaplacePlane => x !== null);
  return { steady, capacitance, links, planes, nodeCount: steady.nodes.length };
}

/**
 * Transfer matrix at s: out[j·S + c] = rise of node j per W of source c, each source being a
 * weight vector over nodes (sources[c][node], summing to 1).
 */
export function assemblyResponseAt(a: LaplaceAssembly, s: number, sources: readonly Float64Array[]): Float64Array {
  const n = a.nodeCount;
  const K = new Float64Array(n * n);
  for (let i = 0; i < n; i++) K[i * n + i] = s * a.capacitance[i];
  for (const [p, q, r] of a.links) {
    const g = 1 / r;
    K[p * n + p] += g;
    K[q * n + q] += g;
    K[p * n + q] -= g;
    K[q * n + p] -= g;
  }
  for (const plane of a.planes) {
    const m = plane.kernel.count;
    const D = planeMatrixAt(plane.kernel, s);
    for (let i = 0; i < m; i++) D[i * m + i] += plane.resistance[i];
    const f = luFactor(D, m);
    const e = new Float64Array(m);
    for (let i = 0; i < m; i++) {
      e.fill(0);
      e[i] = 1;
      const col = luSolve(f, e);
      const ni = plane.contactNode[i];
      for (let j = 0; j < m; j++) K[plane.contactNode[j] * n + ni] += col[j];
    }
  }
  const f = luFactor(K, n);
  const S = sources.length;
  const out = new Float64Array(n * S);
  sources.forEach((w, c) => {
    const z = luSolve(f, w);
    for (let j = 0; j < n; j++) out[j * S + c] = z[j];
  });
  return out;
}
