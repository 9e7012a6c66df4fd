/**
 * Handbook materials and common-practice package materials (SI units) with the source of each value.
 * Metals at 300 K: Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1.
 */

/** One material: in-plane and through-plane conductivity (W/m·K), density (kg/m³), specific heat (J/kg·K). */
export interface DemoMaterial {
  id: string;
  name: string;
  kxy: number;
  kz: number;
  rho: number;
  cp: number;
  /** Where the numbers come from. */
  source: string;
}

const TABLE_A1 = 'Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1 (300 K)';
const PRACTICE = 'common practice (typical package value, no single source)';

/** The demo's material list. */
export const DEMO_MATERIALS: readonly DemoMaterial[] = [
  { id: 'si', name: 'Silicon', kxy: 148, kz: 148, rho: 2330, cp: 712, source: TABLE_A1 },
  { id: 'cu', name: 'Copper (pure)', kxy: 401, kz: 401, rho: 8933, cp: 385, source: TABLE_A1 },
  { id: 'al', name: 'Aluminium (pure)', kxy: 237, kz: 237, rho: 2702, cp: 903, source: TABLE_A1 },
  { id: 'tim-polymer', name: 'Polymer TIM (gel / paste)', kxy: 3, kz: 3, rho: 2600, cp: 900, source: `${PRACTICE}: polymer TIM 1–6 W/m·K` },
  { id: 'microbump-underfill', name: 'Microbump + underfill layer', kxy: 1.5, kz: 5, rho: 3500, cp: 600, source: `${PRACTICE}: microbump/underfill layer 20–30 µm, effective k 2–20 W/m·K through-plane` },
  { id: 'dram-bond', name: 'DRAM bond layer (bumps + film)', kxy: 0.8, kz: 2, rho: 3000, cp: 700, source: `${PRACTICE}: bonded micro-bump / non-conductive film layer` },
  { id: 'c4-underfill', name: 'C4 bumps + underfill', kxy: 0.6, kz: 2, rho: 4000, cp: 500, source: `${PRACTICE}: underfill 0.3–0.7 W/m·K, raised through-plane by the solder bumps` },
  { id: 'organic-substrate', name: 'Organic build-up substrate', kxy: 25, kz: 1, rho: 2200, cp: 900, source: `${PRACTICE}: copper planes give high in-plane, dielectric low through-plane conductivity` },
  { id: 'mold', name: 'Mold compound', kxy: 0.8, kz: 0.8, rho: 2000, cp: 900, source: `${PRACTICE}: mold 0.6–1 W/m·K` },
];

/** Look a demo material up by id (throws for an unknown id: the demo is fixed data). */
export function material(id: string): DemoMaterial {
  const m = DEMO_MATERIALS.find((x) => x.id === id);
  if (!m) throw new Error(`unknown demo material ${id}`);
  return m;
}
