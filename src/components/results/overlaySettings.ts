/** Which result overlays the layout canvas shows (each switchable). */

/** Overlay switches: temperature map plane, heat-flow arrows with their threshold (K), part badges. */
export interface OverlaySettings {
  plane: 'off' | 'interposer' | 'lid';
  arrows: boolean;
  /** Contributions below this are hidden, K. */
  threshold: number;
  badges: boolean;
  /** Badge value: the temperature the limit check uses, the hot spot, or the mean junction temperature. */
  badgeValue: 'checked' | 'peak' | 'junction';
}

/** Defaults: badges on (checked temperature), no arrows (2 K threshold when switched on), no map. */
export function defaultOverlaySettings(): OverlaySettings {
  return { plane: 'off', arrows: false, threshold: 2, badges: true, badgeValue: 'checked' };
}
