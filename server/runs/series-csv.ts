/** The CSV form of a run's series (`GET /api/runs/:id/series.csv`). */
import type { DecodedSeries } from './series-codec';

const quoteIfNeeded = (text: string): string =>
  /[",\n\r]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;

/**
 * Header `t_s,<channel ids...>`, then one row per sample. Numbers are written in JavaScript's
 * shortest round-trip form (reading them back gives the stored doubles); a missing value is empty.
 */
export function seriesToCsv(series: DecodedSeries): string {
  const lines: string[] = [['t_s', ...series.channels.map((c) => quoteIfNeeded(c.id))].join(',')];
  const cell = (v: number | undefined): string =>
    v !== undefined && Number.isFinite(v) ? String(v) : '';
  for (let i = 0; i < series.t_s.length; i += 1) {
    const row = [cell(series.t_s[i])];
    for (const channel of series.channels) row.push(cell(channel.values[i]));
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}
