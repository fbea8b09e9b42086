/**
 * Pipe sizes a builder buys: Schedule 40 outside and inside diameters by nominal size, and how deep
 * a pipe end sits in a socket fitting (which a cut length must add).
 */

/**
 * Schedule 40 pipe (ASME B36.10; the same sizes as Schedule 40 PVC, ASTM D1785): nominal size,
 * outside and inside diameter, m; and the minimum socket depth of Schedule 40 socket fittings, m
 * (ASTM D2466 socket depths, from memory: measure your own fitting).
 */
export const SCHEDULE_40 = [
  { size: '½ in', outsideM: 0.0213, insideM: 0.0158, socketDepthM: 0.0175 },
  { size: '¾ in', outsideM: 0.0267, insideM: 0.0209, socketDepthM: 0.0183 },
  { size: '1 in', outsideM: 0.0334, insideM: 0.0266, socketDepthM: 0.0222 },
  { size: '1¼ in', outsideM: 0.0422, insideM: 0.0351, socketDepthM: 0.0238 },
  { size: '1½ in', outsideM: 0.0483, insideM: 0.0409, socketDepthM: 0.0278 },
  { size: '2 in', outsideM: 0.0603, insideM: 0.0525, socketDepthM: 0.0294 },
  { size: '3 in', outsideM: 0.0889, insideM: 0.0779, socketDepthM: 0.0445 },
  { size: '4 in', outsideM: 0.1143, insideM: 0.1023, socketDepthM: 0.0508 },
] as const;

/** Diameters within this of a listed one count as that size, m. */
const MATCH_TOLERANCE_M = 0.0008;

/** The Schedule 40 size whose inside (or, failing that, outside) diameter matches, or null. */
export function nominalPipeSize(diameters: { insideM?: number; outsideM?: number }): string | null {
  const { insideM, outsideM } = diameters;
  const row =
    (insideM !== undefined &&
      SCHEDULE_40.find((r) => Math.abs(r.insideM - insideM) <= MATCH_TOLERANCE_M)) ||
    (outsideM !== undefined &&
      SCHEDULE_40.find((r) => Math.abs(r.outsideM - outsideM) <= MATCH_TOLERANCE_M));
  return row ? `${row.size} Schedule 40` : null;
}

/**
 * How far a standpipe of outside diameter `outsideM` sits below the bed floor in its bulkhead
 * fitting's socket, m: the Schedule 40 socket depth of the nearest size (ASTM D2466, from memory).
 * Bulkhead fittings differ; the build sheet lets the builder enter the depth of their own.
 */
export function defaultFittingDepthM(outsideM: number): number {
  let best: (typeof SCHEDULE_40)[number] = SCHEDULE_40[0];
  for (const row of SCHEDULE_40)
    if (Math.abs(row.outsideM - outsideM) < Math.abs(best.outsideM - outsideM)) best = row;
  return best.socketDepthM;
}
