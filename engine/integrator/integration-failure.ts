/** A numerical failure raised inside the integration loop and turned into a `failed` outcome. */
export class IntegrationFailure extends Error {
  readonly code = 'integration-failed';

  /** Throws an IntegrationFailure naming the first non-finite component of `values`. */
  static assertFinite(values: Float64Array, timeS: number, what: string): void {
    for (let i = 0; i < values.length; i += 1) {
      if (!Number.isFinite(values[i])) {
        throw new IntegrationFailure(`${what} component ${i} is not finite at t = ${timeS} s`);
      }
    }
  }
}
