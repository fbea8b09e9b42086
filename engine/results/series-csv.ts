import type { SimulationResult } from './run-result';

/** The series as CSV: a header `t_s,<channel id>[<unit>],…` and one row per sample. */
export function seriesCsv(series: SimulationResult['series']): string {
  const header = [
    't_s',
    ...series.channels.map((c) => (c.unit === '' ? c.id : `${c.id} [${c.unit}]`)),
  ];
  const rows = [header.map(quote).join(',')];
  for (let i = 0; i < series.t_s.length; i += 1) {
    const cells = [String(series.t_s[i]), ...series.channels.map((c) => String(c.values[i] ?? ''))];
    rows.push(cells.join(','));
  }
  return `${rows.join('\n')}\n`;
}

function quote(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
