import type { CellRegime } from '../../../../shared/contracts/sweeps';

/** How a regime looks on the map and in the legend. */
export interface RegimeStyle {
  readonly label: string;
  /** Fill of its cells and bands (a calm palette of our own; readable in both schemes). */
  readonly color: string;
  readonly meaning: string;
}

/** Every regime a cell can show, in legend order. */
export const REGIME_STYLES: Readonly<Record<CellRegime, RegimeStyle>> = {
  cycling: { label: 'Cycling', color: '#3d9a7a', meaning: 'floods and drains' },
  'spill-stall': {
    label: 'Spill stall',
    color: '#d9a441',
    meaning: 'trickles over the standpipe, never primes',
  },
  'siphon-lock': { label: 'Siphon lock', color: '#c2410c', meaning: 'primes and never breaks' },
  'rim-overflow': { label: 'Rim overflow', color: '#8e2b5c', meaning: 'spills over the bed rim' },
  flooded: { label: 'Flooded', color: '#5b7f9e', meaning: 'at flood level without a full cycle' },
  idle: {
    label: 'Never fills',
    color: '#b8c4cc',
    meaning: 'does not reach the standpipe in the run',
  },
  invalid: {
    label: 'Impossible',
    color: '#eceff1',
    meaning: 'the values make an impossible geometry',
  },
  failed: { label: 'Failed', color: '#607d8b', meaning: 'the engine could not finish' },
};

/** Regimes in legend order. */
export const REGIME_ORDER = Object.keys(REGIME_STYLES) as CellRegime[];
