/**
 * The flux-channel request (POST body / `npm run cli -- channel file.json`) and its response. SI units:
 * lengths m, conductivity W/m·K, h W/m²K, contact resistance m²K/W, power W, density kg/m³,
 * specific heat J/kg·K, times s; results in K/W and K (rises above the fluid).
 */
import { z } from 'zod';

const num = (what: string, unit: string) => z.number({ error: `${what} must be a finite number (${unit}).` });
const positive = (what: string, unit: string) => num(what, unit).gt(0, { error: `${what} must be greater than 0 ${unit}.` });
const nonNegative = (what: string, unit: string) => num(what, unit).gte(0, { error: `${what} must be 0 or more ${unit}.` });

/** One layer: isotropic `k`, or orthotropic `kxy` (in-plane) and `kz` (through-plane). */
export const channelLayerSchema = z
  .object({
    thickness: positive('A layer thickness', 'm').lte(0.5, { error: 'A layer thickness above 0.5 m is not a package layer.' }),
    k: positive('The conductivity k', 'W/m·K').lte(1e4, { error: 'A conductivity above 10,000 W/m·K is not a real material.' }).optional(),
    kxy: positive('The in-plane conductivity kxy', 'W/m·K').lte(1e4, { error: 'A conductivity above 10,000 W/m·K is not a real material.' }).optional(),
    kz: positive('The through-plane conductivity kz', 'W/m·K').lte(1e4, { error: 'A conductivity above 10,000 W/m·K is not a real material.' }).optional(),
    contactResistance: nonNegative('A contact resistance', 'm²K/W').lte(1, { error: 'A contact resistance above 1 m²K/W is not plausible.' }).optional(),
    rho: positive('The density rho', 'kg/m³').optional(),
    cp: positive('The specific heat cp', 'J/kg·K').optional(),
  })
  .strict()
  .superRefine((layer, ctx) => {
    const iso = layer.k !== undefined;
    const ortho = layer.kxy !== undefined || layer.kz !== undefined;
    if (iso && ortho) ctx.addIssue({ code: 'custom', path: ['k'], message: 'Give either k, or kxy and kz — not both.' });
    else if (!iso && !(layer.kxy !== undefined && layer.kz !== undefined)) {
      ctx.addIssue({ code: 'custom', path: ['k'], message: 'Each layer needs a conductivity: k, or both kxy and kz (W/m·K).' });
    }
  });
export type ChannelLayerInput = z.infer<typeof channelLayerSchema>;

/** Layers from the source plane outward, then the face conductance h (0 = adiabatic). */
export const channelStackSchema = z
  .object({
    layers: z.array(channelLayerSchema).max(32, { error: 'At most 32 layers per side.' }),
    h: nonNegative('The face conductance h', 'W/m²K').lte(1e9, { error: 'A face conductance above 1e9 W/m²K is not plausible.' }),
  })
  .strict();

/** A uniform-flux rectangle: centre (x, y), size width × height, power. */
export const channelSourceSchema = z
  .object({
    x: num('A source centre x', 'm'),
    y: num('A source centre y', 'm'),
    width: positive('A source width', 'm'),
    height: positive('A source height', 'm'),
    power: nonNegative('A source power', 'W').lte(1e6, { error: 'A source power above 1 MW is not plausible.' }),
  })
  .strict();

const modeCount = (axis: string) =>
  z
    .number({ error: `The truncation ${axis} must be a whole number of modes.` })
    .int({ error: `The truncation ${axis} must be a whole number of modes.` })
    .min(1, { error: `The truncation ${axis} must be at least 1 mode.` })
    .max(65536, { error: `The truncation ${axis} is absurdly large (at most 65,536 modes per axis, and M·N within the cap).` });

const gridSide = z
  .number()
  .int()
  .refine((v) => v >= 8 && v <= 1024 && (v & (v - 1)) === 0, { error: 'A map side must be a power of two from 8 to 1024.' });

/** The whole request body. */
export const channelRequestSchema = z
  .object({
    footprint: z.object({ x: positive('The footprint length x', 'm').lte(1), y: positive('The footprint length y', 'm').lte(1) }).strict(),
    above: channelStackSchema,
    below: channelStackSchema,
    sources: z.array(channelSourceSchema).min(1, { error: 'At least one source is needed.' }).max(256, { error: 'At most 256 sources.' }),
    truncation: z.object({ m: modeCount('m'), n: modeCount('n') }).strict().optional(),
    /** Reserved for the transient solve: output times (s), positive and increasing; the steady solve ignores them. */
    times: z
      .array(positive('A time', 's'))
      .max(1000)
      .refine((t) => t.every((v, i) => i === 0 || v > t[i - 1]), { error: 'Times must increase.' })
      .optional(),
    /** Optional temperature map of the source plane: cells nx × ny (powers of two). */
    map: z.object({ nx: gridSide, ny: gridSide }).strict().optional(),
  })
  .strict();
export type ChannelRequest = z.infer<typeof channelRequestSchema>;

/** Response of a steady channel solve. */
export interface ChannelResponse {
  /** matrix[j][i]: mean rise of source j per W in source i (K/W). */
  matrix: number[][];
  /** Mean rise of each source (K). */
  rise: number[];
  /** Peak rise over each source's rectangle (K), and where it is (m). */
  peakRise: number[];
  peakAt: { x: number; y: number }[];
  /** roughSources: indices of sources below 1 % of the largest area, left out of the automatic search. */
  truncation: { m: number; n: number; auto: boolean; converged: boolean; lastChange: number; roughSources?: number[] };
  /** Heat leaving through the top and bottom faces (W); relativeError = |up + down − power| / power. */
  energyBalance: { power: number; up: number; down: number; relativeError: number };
  /** Source-plane rise map (K), values[iy·nx + ix], cell centres, row 0 = lowest y; when requested. */
  map?: { nx: number; ny: number; dx: number; dy: number; values: number[] };
}
