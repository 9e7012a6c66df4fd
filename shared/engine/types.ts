/** Geometry and material types of the flux-channel engine (SI units: m, W, K, W/m·K). */

/** One homogenised layer: thickness (m), in-plane and through-plane conductivity (W/m·K). */
export interface ChannelLayer {
  thickness: number;
  kxy: number;
  kz: number;
  /** Density (kg/m³); needed only when the Laplace variable s > 0. */
  rho?: number;
  /** Specific heat (J/kg·K); needed only when s > 0. */
  cp?: number;
  /** Interface resistance on the layer's +z face (toward the lid), m²K/W. */
  contactResistance?: number;
}

/** Layers listed from the source plane outward, ending in a face of conductance h (W/m²K; 0 = adiabatic). */
export interface ChannelStack {
  layers: readonly ChannelLayer[];
  h: number;
}

/** Rectangular flux channel 0 ≤ x ≤ lx, 0 ≤ y ≤ ly with adiabatic sides; stacks above (+z) and below the source plane. */
export interface Channel {
  lx: number;
  ly: number;
  above: ChannelStack;
  below: ChannelStack;
}

/** Uniform-flux rectangle centred at (x, y), size width (along x) × height (along y), in m. */
export interface RectSource {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Number of cosine modes kept in x (m) and y (n): modes 0 … m−1 and 0 … n−1. */
export interface Truncation {
  m: number;
  n: number;
}
