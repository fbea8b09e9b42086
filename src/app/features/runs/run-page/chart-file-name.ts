/** The download name of a chart, e.g. "run-1a2b3c4d-levels.svg". */
export function chartFileName(runId: string, chart: string, format: 'svg' | 'png'): string {
  return `run-${runId.slice(0, 8)}-${chart}.${format}`;
}
