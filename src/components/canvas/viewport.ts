/**
 * Canvas coordinates. The drawing ("world") unit is 1 mm with x to the right and y downward from the
 * interposer's top-left corner, so a model point (x, y) in m from the lower-left corner sits at
 * (1000·x, H_mm − 1000·y). d3-zoom's transform maps world mm to screen px.
 */
import { zoomIdentity, type ZoomTransform } from 'd3';
import type { Model } from '@shared/schemas/model';

/** Width in px of the rulers along the top and left edges. */
export const RULER = 26;

/** World box (mm) that "fit to view" shows: substrate, lid and interposer with a margin. */
export function worldBox(model: Model) {
  const { interposer: ip, substrate: sub, lid } = model.stack;
  const W = ip.width * 1000;
  const H = ip.height * 1000;
  const half = (w: number) => (w * 1000) / 2;
  const x0 = Math.min(0, W / 2 - half(sub.width), W / 2 + lid.offsetX * 1000 - half(lid.width)) - 2;
  const x1 = Math.max(W, W / 2 + half(sub.width), W / 2 + lid.offsetX * 1000 + half(lid.width)) + 2;
  const y0 = Math.min(0, H / 2 - half(sub.height), H / 2 - lid.offsetY * 1000 - half(lid.height)) - 2;
  const y1 = Math.max(H, H / 2 + half(sub.height), H / 2 - lid.offsetY * 1000 + half(lid.height)) + 2;
  return { x0, x1, y0, y1 };
}

/** The zoom transform that fits the world box into a view of width × height px (rulers excluded). */
export function fitTransform(model: Model, width: number, height: number): ZoomTransform {
  const b = worldBox(model);
  const availW = Math.max(50, width - RULER - 16);
  const availH = Math.max(50, height - RULER - 16);
  const k = Math.min(availW / (b.x1 - b.x0), availH / (b.y1 - b.y0));
  const tx = RULER + 8 + (availW - k * (b.x1 - b.x0)) / 2 - k * b.x0;
  const ty = RULER + 8 + (availH - k * (b.y1 - b.y0)) / 2 - k * b.y0;
  return zoomIdentity.translate(tx, ty).scale(k);
}

/** World rectangle (mm, y down) of a model-space rectangle given by centre and size in m. */
export function worldRect(Hmm: number, cx: number, cy: number, w: number, h: number) {
  return { x: (cx - w / 2) * 1000, y: Hmm - (cy + h / 2) * 1000, width: w * 1000, height: h * 1000 };
}

/** Model position (m, y up) of a screen point given in px relative to the svg. */
export function toModel(t: ZoomTransform, Hmm: number, px: number, py: number) {
  const [wx, wy] = t.invert([px, py]);
  return { x: wx / 1000, y: (Hmm - wy) / 1000 };
}
