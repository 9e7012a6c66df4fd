/**
 * Assembly geometry (physics.md §2): part footprints on the interposer (rotation 90/270 swaps width
 * and height), their images in lid coordinates, and the two spreading planes as flux channels.
 */
import type { Model, Part } from '../../schemas/model';
import { fmtMm } from '../checks';
import { EngineInputError } from '../errors';
import type { Channel, ChannelLayer, RectSource } from '../types';

/** Where a part sits: footprint in interposer coordinates and, if it touches the lid, in lid coordinates. */
export interface PartGeometry {
  index: number;
  part: Part;
  /** Footprint in interposer coordinates (m), after rotation. */
  footprint: RectSource;
  /** Footprint in lid coordinates, or null when tim1 is null (no lid contact). */
  lidFootprint: RectSource | null;
  /** Footprint area (m²). */
  area: number;
}

/** Lower-left corner of the lid in interposer coordinates (lid centre = interposer centre + offset). */
export function lidOrigin(model: Model): { x: number; y: number } {
  const { interposer, lid } = model.stack;
  return { x: interposer.width / 2 + lid.offsetX - lid.width / 2, y: interposer.height / 2 + lid.offsetY - lid.height / 2 };
}

/** Footprint of a part after rotation (90/270 swap width and height). */
export function rotatedSize(part: Part): { width: number; height: number } {
  const swap = part.rotation === 90 || part.rotation === 270;
  return swap ? { width: part.height, height: part.width } : { width: part.width, height: part.height };
}

function inside(r: RectSource, lx: number, ly: number): boolean {
  const tol = 1e-9;
  return r.x - r.width / 2 >= -tol && r.x + r.width / 2 <= lx + tol && r.y - r.height / 2 >= -tol && r.y + r.height / 2 <= ly + tol;
}

/** Geometry of every part; throws EngineInputError when a part leaves the interposer or the lid. */
export function partGeometries(model: Model): PartGeometry[] {
  const { interposer, lid } = model.stack;
  const origin = lidOrigin(model);
  return model.parts.map((part, index) => {
    const size = rotatedSize(part);
    const footprint = { x: part.x, y: part.y, ...size };
    if (!inside(footprint, interposer.width, interposer.height)) {
      throw new EngineInputError(`parts[${index}]`, `Part "${part.name}" reaches outside the ${fmtMm(interposer.width)} × ${fmtMm(interposer.height)} mm interposer.`);
    }
    let lidFootprint: RectSource | null = null;
    if (part.tim1) {
      lidFootprint = { x: part.x - origin.x, y: part.y - origin.y, ...size };
      if (!inside(lidFootprint, lid.width, lid.height)) {
        throw new EngineInputError(`parts[${index}]`, `Part "${part.name}" touches the lid but reaches outside the lid's footprint; move it or enlarge the lid.`);
      }
    }
    return { index, part, footprint, lidFootprint, area: size.width * size.height };
  });
}

/** Lid plane: the lid's layers (listed from the parts upward) to h_top; below the lid adiabatic. */
export function lidChannel(model: Model): Channel {
  const { lid, cooling } = model.stack;
  return { lx: lid.width, ly: lid.height, above: { layers: lid.layers.map(plain), h: cooling.top.h }, below: { layers: [], h: 0 } };
}

/**
 * Interposer plane: interposer layers, C4 and substrate layers (each listed from the top down) in the
 * interposer footprint, then h_bottom scaled by substrate area / interposer area (the substrate rim is
 * taken as fully effective — an idealisation); above the interposer adiabatic.
 */
export function interposerChannel(model: Model): Channel {
  const { interposer, c4, substrate, cooling } = model.stack;
  const layers = [...interposer.layers, c4, ...substrate.layers].map(plain);
  const areaRatio = Math.max(1, (substrate.width * substrate.height) / (interposer.width * interposer.height));
  return { lx: interposer.width, ly: interposer.height, above: { layers: [], h: 0 }, below: { layers, h: cooling.bottom.h * areaRatio } };
}

/** A model layer reduced to what the channel uses (stable cache keys). */
export function plain(layer: ChannelLayer): ChannelLayer {
  const out: ChannelLayer = { thickness: layer.thickness, kxy: layer.kxy, kz: layer.kz };
  if (layer.contactResistance) out.contactResistance = layer.contactResistance;
  if (layer.rho !== undefined) out.rho = layer.rho;
  if (layer.cp !== undefined) out.cp = layer.cp;
  return out;
}
