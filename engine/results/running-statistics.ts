/** Count, mean, minimum and maximum of a stream of numbers, in constant memory. */
export class RunningStatistics {
  count = 0;
  private sum = 0;
  private low = Infinity;
  private high = -Infinity;

  /** Adds one value. */
  add(value: number): void {
    this.count += 1;
    this.sum += value;
    this.low = Math.min(this.low, value);
    this.high = Math.max(this.high, value);
  }

  /** Mean, or null before the first value. */
  get mean(): number | null {
    return this.count === 0 ? null : this.sum / this.count;
  }

  /** Smallest value, or null before the first value. */
  get min(): number | null {
    return this.count === 0 ? null : this.low;
  }

  /** Largest value, or null before the first value. */
  get max(): number | null {
    return this.count === 0 ? null : this.high;
  }
}
