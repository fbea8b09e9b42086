/** How a time axis is labelled: seconds, minutes or hours, chosen from the span it shows. */
export interface TimeAxisUnit {
  readonly label: 's' | 'min' | 'h';
  readonly seconds: number;
}

/** Picks the time unit for a span: seconds up to 5 min, minutes up to 5 h, hours beyond. */
export function timeAxisUnit(spanS: number): TimeAxisUnit {
  if (spanS <= 300) return { label: 's', seconds: 1 };
  if (spanS <= 5 * 3600) return { label: 'min', seconds: 60 };
  return { label: 'h', seconds: 3600 };
}

/** Writes a time for a read-out: "1 h 02 min 05 s", "4 min 30 s" or "12.5 s". */
export function formatElapsed(timeS: number): string {
  const whole = Math.round(timeS);
  const hours = Math.floor(whole / 3600);
  const minutes = Math.floor((whole % 3600) / 60);
  const seconds = whole % 60;
  if (hours > 0) return `${hours} h ${pad(minutes)} min ${pad(seconds)} s`;
  if (minutes > 0) return `${minutes} min ${pad(seconds)} s`;
  return `${Number(timeS.toFixed(1))} s`;
}

function pad(value: number): string {
  return value.toString().padStart(2, '0');
}
