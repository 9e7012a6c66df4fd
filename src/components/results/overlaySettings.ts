/** Which result overlays the layout canvas shows (each switchable). */

/** Overlay switches: temperature map plane, heat-flow arrows with their threshold (K), part badges. */
export interface OverlaySettings {
  plane: 'off' | 'interposer' | 'lid';
  arrows: boolean;
  /** Contributions below this are hidden, K. */
  threshold: number;
  badges: boolean;
  /** Badge value: hot spot or mean junction temperature. */
  badgeValue: 'peak' | 'junction';
}

/** Defaults: badges on (peak), no arrows (2 K threshold when switched on), no map. */
export function defaultOverlaySettings(): OverlaySettings {
  return { plane: 'off', arrows: false, threshold: 2, badges: true, badgeValue: 'peak' };
}
