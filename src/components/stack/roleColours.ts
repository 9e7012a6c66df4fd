/** Colours of layer roles in the stack table and the cross-section (our own palette). */
import type { LayerRow } from './layerRows';

/** Fill colour per layer role. */
export const roleColour: Record<LayerRow['role'], string> = {
  lid: '#b57a3c',
  tim: '#b98fcf',
  die: '#8796b5',
  tier: '#6f86b0',
  bond: '#cdb98a',
  bumps: '#d8bf62',
  interposer: '#a3acc0',
  c4: '#c9a24a',
  substrate: '#5f8f5a',
};
