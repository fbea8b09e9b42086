/** A number followed by a metric unit of the sizing sentences ("0.3 m", "61 L", "1.92 kPa"), for tests; not "9.25 min". */
export const METRIC_NUMBER = /\d (?:mm|m²|m|L|kg|kPa)(?=[\s.,;)]|$)/;
