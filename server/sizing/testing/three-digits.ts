/** A number to three significant digits, as the sizing sentences print it (for tests). */
export const threeDigits = (value: number): string => Number(value.toPrecision(3)).toString();
