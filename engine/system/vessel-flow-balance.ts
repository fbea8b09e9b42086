import type { VesselComponent } from '../components/vessel';
import type { ModelContext } from './model-context';

/** Channel endpoints as typed arrays, for the hot loop. */
export interface ChannelEnds {
  readonly from: Int32Array;
  readonly to: Int32Array;
}

/** Sums each vessel's inflow and net inflow over all channels into the given arrays. */
export function sumVesselFlows(
  ends: ChannelEnds,
  flows: Float64Array,
  vesselCount: number,
  inflow: Float64Array,
  net: Float64Array,
): void {
  inflow.fill(0);
  net.fill(0);
  for (let k = 0; k < flows.length; k += 1) {
    const q = flows[k] as number;
    if (q === 0) continue;
    const a = ends.from[k] as number;
    const b = ends.to[k] as number;
    const up = q > 0 ? a : b;
    const down = q > 0 ? b : a;
    const magnitude = Math.abs(q);
    if (down < vesselCount) {
      inflow[down] = (inflow[down] as number) + magnitude;
      net[down] = (net[down] as number) + magnitude;
    }
    if (up < vesselCount) net[up] = (net[up] as number) - magnitude;
  }
}

/**
 * Applies the vessels' limits to the channel flows: an empty vessel's outflows are scaled down to
 * its inflow (it cannot give water it does not have), and a brimful vessel sends its surplus over
 * the rim (lost). Scaling a flow changes it for both ends, so water stays conserved. Fills
 * ctx.inflowM3PerS and ctx.netInflowM3PerS with the values before these limits.
 */
export function applyVesselLimits(
  ctx: ModelContext,
  ends: ChannelEnds,
  vessels: readonly VesselComponent[],
  scratchInflow: Float64Array,
  scratchNet: Float64Array,
): void {
  const flows = ctx.flowM3PerS;
  const n = vessels.length;
  sumVesselFlows(ends, flows, n, ctx.inflowM3PerS, ctx.netInflowM3PerS);
  let limited = false;
  for (const vessel of vessels) {
    if (!vessel.empty) continue;
    const inflow = ctx.inflowM3PerS[vessel.index] as number;
    const net = ctx.netInflowM3PerS[vessel.index] as number;
    if (!(net < 0)) continue;
    scaleOutflows(ends, flows, vessel.index, inflow / (inflow - net));
    limited = true;
  }
  let brim = false;
  for (const vessel of vessels) brim = brim || vessel.brimful;
  if (!brim) return;
  if (limited) sumVesselFlows(ends, flows, n, scratchInflow, scratchNet);
  const net = limited ? scratchNet : ctx.netInflowM3PerS;
  for (const vessel of vessels) {
    if (vessel.brimful) flows[vessel.rimChannel] = Math.max(0, net[vessel.index] as number);
  }
}

/** Multiplies every flow leaving state component `index` by `factor`. */
function scaleOutflows(
  ends: ChannelEnds,
  flows: Float64Array,
  index: number,
  factor: number,
): void {
  for (let k = 0; k < flows.length; k += 1) {
    const q = flows[k] as number;
    if ((q > 0 && ends.from[k] === index) || (q < 0 && ends.to[k] === index)) flows[k] = q * factor;
  }
}
