/** Temperature maps of the two spreading planes (°C) and bilinear sampling of them. */
import { fieldMap, modalTemperatures, type FieldMap } from '../field';
import type { AssemblyNetwork, NetworkState, Plane } from './network';

/** A plane map placed in interposer coordinates: cell (ix, iy) centred at (x0 + (ix+½)dx, y0 + (iy+½)dy). */
export interface PlacedMap extends FieldMap {
  x0: number;
  y0: number;
}

/** Map of one plane's temperature (°C) on an nx × ny cell-centred grid (powers of two). */
export function planeMap(plane: Plane, q: Float64Array, level: number, origin: { x: number; y: number }, nx: number, ny: number): PlacedMap {
  const powers = plane.parts.map((p) => q[p]);
  const theta = modalTemperatures(plane.modes, powers);
  const map = fieldMap(theta, plane.modes.spectra.m, plane.modes.spectra.n, plane.channel.lx, plane.channel.ly, nx, ny);
  for (let i = 0; i < map.values.length; i++) map.values[i] += level;
  return { ...map, x0: origin.x, y0: origin.y };
}

/** Both plane maps of a solved state (the lid's is null when no part touches the lid). */
export function planeMaps(net: AssemblyNetwork, state: NetworkState, lidOrigin: { x: number; y: number }, size: number): { interposer: PlacedMap; lid: PlacedMap | null } {
  return {
    interposer: planeMap(net.interposer, state.qDown, state.interposerLevel, { x: 0, y: 0 }, size, size),
    lid: net.lid ? planeMap(net.lid, state.qUp, state.lidLevel, lidOrigin, size, size) : null,
  };
}

/** Bilinear value of a placed map at (x, y) in interposer coordinates (clamped to the cell centres). */
export function sampleMap(map: PlacedMap, x: number, y: number): number {
  const fx = Math.min(Math.max((x - map.x0) / map.dx - 0.5, 0), map.nx - 1);
  const fy = Math.min(Math.max((y - map.y0) / map.dy - 0.5, 0), map.ny - 1);
  const ix = Math.min(Math.floor(fx), map.nx - 2);
  const iy = Math.min(Math.floor(fy), map.ny - 2);
  const tx = fx - ix;
  const ty = fy - iy;
  const v = map.values;
  const c = iy * map.nx + ix;
  return (1 - ty) * ((1 - tx) * v[c] + tx * v[c + 1]) + ty * ((1 - tx) * v[c + map.nx] + tx * v[c + map.nx + 1]);
}
