/**
 * The cross-section's colours as CSS custom properties set on the component (see its styles), so
 * presentation mode can swap in a high-contrast set. Each entry is an inline style value.
 */
export const PAINT = {
  water: 'var(--xs-water)',
  waterFull: 'var(--xs-water-full)',
  air: 'var(--xs-air)',
  media: 'var(--xs-media)',
  wall: 'var(--xs-wall)',
  pipe: 'var(--xs-pipe)',
  marks: 'var(--xs-marks)',
  marker: 'var(--xs-marker)',
  halo: 'var(--xs-halo)',
  pumpOn: 'var(--xs-pump-on)',
  pumpOff: 'var(--xs-pump-off)',
  pumpDry: 'var(--xs-pump-dry)',
} as const;

/** A text size in user units, scaled by `--xs-text-scale` (larger in presentation mode). */
export function textSize(px: number): string {
  return `calc(${px}px * var(--xs-text-scale, 1))`;
}
