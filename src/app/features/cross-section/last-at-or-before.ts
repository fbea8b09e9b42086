/** The last index in ascending `times` at or before `timeS`, or -1 when every time is later. */
export function lastAtOrBefore(times: ArrayLike<number>, timeS: number): number {
  let low = 0;
  let high = times.length - 1;
  let found = -1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    if ((times[middle] as number) <= timeS) {
      found = middle;
      low = middle + 1;
    } else high = middle - 1;
  }
  return found;
}
