/**
 * A small finite-volume reference for tests: steady conduction in a layered orthotropic block
 * 0 ≤ x ≤ lx, 0 ≤ y ≤ ly, uniform-flux rectangles on the bottom face (z = 0, otherwise adiabatic),
 * adiabatic sides, convection h to a 0 K fluid on the top face. Cell-centred, two-point fluxes
 * (Patankar, Numerical Heat Transfer and Fluid Flow, 1980), solved by Jacobi-preconditioned conjugate
 * gradients (Saad, Iterative Methods for Sparse Linear Systems, 2003, alg. 9.1). Second-order accurate.
 */

/** A layer of the block, listed from the source face upward, with its cell count through the thickness. */
export interface FvLayer {
  thickness: number;
  kxy: number;
  kz: number;
  /** Interface resistance on the layer's +z face (m²K/W). */
  contactResistance?: number;
  cells: number;
}

/** Block, grid and sources. Source edges should lie on grid lines (the test keeps them there). */
export interface FvProblem {
  lx: number;
  ly: number;
  nx: number;
  ny: number;
  layers: FvLayer[];
  h: number;
  sources: { x: number; y: number; width: number; height: number; power: number }[];
}

/** Mean rise of each source rectangle on the bottom face (K) and the CG figures. */
export interface FvResult {
  meanRise: number[];
  iterations: number;
  residual: number;
}

function overlap(a0: number, a1: number, b0: number, b1: number): number {
  return Math.max(0, Math.min(a1, b1) - Math.max(a0, b0));
}

/** Solve the problem; throws if CG does not reach the tolerance within maxIterations. */
export function solveFv(p: FvProblem, tolerance = 1e-10, maxIterations = 20000): FvResult {
  const { nx, ny } = p;
  const dx = p.lx / nx;
  const dy = p.ly / ny;
  const dzs: number[] = [];
  const kz: number[] = [];
  const kxy: number[] = [];
  const rTop: number[] = [];
  for (const l of p.layers) {
    for (let c = 0; c < l.cells; c++) {
      dzs.push(l.thickness / l.cells);
      kz.push(l.kz);
      kxy.push(l.kxy);
      rTop.push(c === l.cells - 1 ? (l.contactResistance ?? 0) : 0);
    }
  }
  const nz = dzs.length;
  const plane = nx * ny;
  const n = plane * nz;
  const gx = new Float64Array(nz);
  const gy = new Float64Array(nz);
  const gz = new Float64Array(nz);
  for (let k = 0; k < nz; k++) {
    gx[k] = (kxy[k] * dy * dzs[k]) / dx;
    gy[k] = (kxy[k] * dx * dzs[k]) / dy;
    gz[k] = k < nz - 1 ? (dx * dy) / (dzs[k] / (2 * kz[k]) + rTop[k] + dzs[k + 1] / (2 * kz[k + 1])) : (dx * dy) / (dzs[k] / (2 * kz[k]) + rTop[k] + 1 / p.h);
  }
  const diag = new Float64Array(n);
  for (let k = 0; k < nz; k++) {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        let d = 0;
        if (i > 0) d += gx[k];
        if (i < nx - 1) d += gx[k];
        if (j > 0) d += gy[k];
        if (j < ny - 1) d += gy[k];
        d += gz[k];
        if (k > 0) d += gz[k - 1];
        diag[k * plane + j * nx + i] = d;
      }
    }
  }
  const apply = (v: Float64Array, out: Float64Array): void => {
    for (let k = 0; k < nz; k++) {
      for (let j = 0; j < ny; j++) {
        for (let i = 0; i < nx; i++) {
          const c = k * plane + j * nx + i;
          let s = diag[c] * v[c];
          if (i > 0) s -= gx[k] * v[c - 1];
          if (i < nx - 1) s -= gx[k] * v[c + 1];
          if (j > 0) s -= gy[k] * v[c - nx];
          if (j < ny - 1) s -= gy[k] * v[c + nx];
          if (k > 0) s -= gz[k - 1] * v[c - plane];
          if (k < nz - 1) s -= gz[k] * v[c + plane];
          out[c] = s;
        }
      }
    }
  };
  const b = new Float64Array(n);
  for (const s of p.sources) {
    const q = s.power / (s.width * s.height);
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const a = overlap(i * dx, (i + 1) * dx, s.x - s.width / 2, s.x + s.width / 2) * overlap(j * dy, (j + 1) * dy, s.y - s.height / 2, s.y + s.height / 2);
        b[j * nx + i] += q * a;
      }
    }
  }
  const { x, iterations, residual } = pcg(apply, (r, z) => {
    for (let i = 0; i < r.length; i++) z[i] = r[i] / diag[i];
  }, b, tolerance, maxIterations);
  const meanRise = p.sources.map((s) => {
    let sum = 0;
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const a = overlap(i * dx, (i + 1) * dx, s.x - s.width / 2, s.x + s.width / 2) * overlap(j * dy, (j + 1) * dy, s.y - s.height / 2, s.y + s.height / 2);
        if (a === 0) continue;
        const c = j * nx + i;
        // Face temperature: cell centre plus the drop of the face flux over half a cell.
        sum += a * (x[c] + ((b[c] / (dx * dy)) * dzs[0]) / (2 * kz[0]));
      }
    }
    return sum / (s.width * s.height);
  });
  return { meanRise, iterations, residual };
}

/** Preconditioned conjugate gradients (Saad 2003, alg. 9.1); `precondition(r, z)` writes z = M⁻¹r. */
export function pcg(
  apply: (v: Float64Array, out: Float64Array) => void,
  precondition: (r: Float64Array, z: Float64Array) => void,
  b: Float64Array,
  tolerance: number,
  maxIterations: number,
  who = 'solveFv',
): { x: Float64Array; iterations: number; residual: number } {
  const n = b.length;
  const x = new Float64Array(n);
  const r = Float64Array.from(b);
  const z = new Float64Array(n);
  const q = new Float64Array(n);
  const dot = (u: Float64Array, v: Float64Array): number => {
    let s = 0;
    for (let i = 0; i < n; i++) s += u[i] * v[i];
    return s;
  };
  precondition(r, z);
  const d = Float64Array.from(z);
  let rz = dot(r, z);
  const bNorm = Math.sqrt(dot(b, b));
  for (let it = 1; it <= maxIterations; it++) {
    apply(d, q);
    const alpha = rz / dot(d, q);
    for (let i = 0; i < n; i++) {
      x[i] += alpha * d[i];
      r[i] -= alpha * q[i];
    }
    const residual = Math.sqrt(dot(r, r)) / bNorm;
    if (residual < tolerance) return { x, iterations: it, residual };
    precondition(r, z);
    const rzNew = dot(r, z);
    const beta = rzNew / rz;
    rz = rzNew;
    for (let i = 0; i < n; i++) d[i] = z[i] + beta * d[i];
  }
  throw new Error(`${who}: conjugate gradients did not converge in ${maxIterations} iterations`);
}

