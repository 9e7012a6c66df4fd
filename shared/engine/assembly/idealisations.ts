/** The idealisations of the assembly model, in words for the UI, reports and docs. */
export const IDEALISATIONS: readonly string[] = [
  'Each layer is homogenised: uniform, possibly orthotropic conductivity (TSVs, bumps and underfill smeared into one effective layer).',
  'The lid plane and the interposer plane are rectangular flux channels of their own footprints with adiabatic sides.',
  'The substrate is folded into the interposer footprint; its larger area is credited by scaling the board-side h by substrate area / interposer area (the rim taken as fully effective: optimistic for a substrate that conducts well through its thickness, conservative for one that does not).',
  'The lid underside between parts and the interposer top between parts are adiabatic (no heat through mold, underfill fillets or air).',
  'Cooling is a uniform effective conductance h on the lid top and on the board side, each to one fluid temperature.',
  'Each part is a 1-D column between its two footprints; its heat enters each plane as uniform flux over the footprint.',
  'A memory stack is a ladder of nodes (base die and DRAM tiers); each node is the mean temperature of its die.',
  'Hot spots add the planes\' variation under a part (passed as a 1-D divider, no extra spreading in the die) and the part\'s own power-map spreading to the mean junction temperature.',
  'Against our own 3-D finite-volume model of a small three-part assembly, junction rises agree within 2 %; self resistances read up to 10 % high and couplings up to 5 % low, so a low-power part beside a hot one can read about 2 % of its rise cool.',
  'Conductivities do not depend on temperature; results are steady-state estimates, not a substitute for detailed simulation or JESD51 measurement.',
];
