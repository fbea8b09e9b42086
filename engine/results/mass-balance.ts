import { totalWaterM3, type StateLayout } from '../system/state-layout';

/**
 * Relative mass-balance error of a run: |W_end − W_start| / W_start, where W is the water in the
 * vessels plus the water held in pipes plus the water lost (the conserved total). When the system
 * starts empty, the total rim volume `capacityM3` is the scale instead.
 */
export function massBalanceError(
  layout: StateLayout,
  initial: Float64Array,
  final: Float64Array,
  capacityM3: number,
): number {
  const start = totalWaterM3(layout, initial);
  const end = totalWaterM3(layout, final);
  const scale = start > 0 ? start : capacityM3;
  return scale > 0 ? Math.abs(end - start) / scale : 0;
}
