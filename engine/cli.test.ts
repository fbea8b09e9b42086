import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = join(__dirname, '..');
const work = mkdtempSync(join(tmpdir(), 'tidewright-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function cli(...args: string[]) {
  const result = spawnSync(
    process.execPath,
    ['--import', 'tsx', join(root, 'engine/cli.ts'), ...args],
    { cwd: root, encoding: 'utf8', timeout: 60_000 },
  );
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('npm run simulate', { timeout: 120_000 }, () => {
  it('prints a short summary and exits 0 for a completed run', () => {
    const run = cli('scenarios/tabletop-classroom.json', '--duration', '20 min');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('bed: cycling');
    expect(run.stdout).toContain('Verdicts');
    expect(run.stdout).toContain('tank: lowest');
  });

  it('prints one JSON object with the documented fields for --json', () => {
    const run = cli('scenarios/stalling-siphon.json', '--json', '--duration', '1 h');
    expect(run.status).toBe(0);
    const result = JSON.parse(run.stdout) as Record<string, unknown> & {
      summary: { beds: Array<Record<string, unknown>> };
      stats: Record<string, number>;
      events: Array<{ kind: string }>;
    };
    expect(Object.keys(result)).toEqual(
      expect.arrayContaining(['summary', 'events', 'verdicts', 'massBalanceError', 'stats']),
    );
    expect(Object.keys(result.summary.beds[0] ?? {})).toEqual(
      expect.arrayContaining([
        'id',
        'cycles',
        'periodMean_s',
        'floodMean_s',
        'drainMean_s',
        'highLevel_m',
        'lowLevel_m',
        'state',
      ]),
    );
    expect(result.summary.beds[0]?.['state']).toBe('spill-stall');
    expect(result.events.some((e) => e.kind === 'spill-stall')).toBe(true);
    expect(result.stats['wall_ms']).toBeGreaterThan(0);
    expect(result.stats['simulated_s']).toBe(3600);
  });

  it('writes the series as CSV for --out', () => {
    const out = join(work, 'series.csv');
    const run = cli('scenarios/tabletop-classroom.json', '--duration', '60 s', '--out', out);
    expect(run.status).toBe(0);
    const lines = readFileSync(out, 'utf8').trim().split('\n');
    expect(lines[0]).toMatch(/^t_s,level:tank \[m\],level:bed \[m\],volume:tank \[m3\]/);
    expect(lines.length).toBeGreaterThan(30);
    expect(lines[1]?.split(',').length).toBe(lines[0]?.split(',').length);
  });

  it('exits 2 with each problem and its field path on stderr, and no stack trace, for an invalid scenario', () => {
    const bad = JSON.parse(
      readFileSync(join(root, 'scenarios/tabletop-classroom.json'), 'utf8'),
    ) as { vessels: Array<Record<string, unknown>> };
    (bad.vessels[1] as { drain: { standpipe: { height: string } } }).drain.standpipe.height =
      '0.5 m';
    (bad.vessels[0] as Record<string, unknown>)['height'] = '2 kg';
    const file = join(work, 'bad.json');
    writeFileSync(file, JSON.stringify(bad));
    const run = cli(file);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('vessels[0].height');
    expect(run.stdout).toBe('');
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });

  it('exits 2 for a file that is not JSON, an unknown option or a bad duration', () => {
    const file = join(work, 'broken.json');
    writeFileSync(file, '{ not json');
    expect(cli(file).status).toBe(2);
    expect(cli('scenarios/tabletop-classroom.json', '--fast').status).toBe(2);
    const duration = cli('scenarios/tabletop-classroom.json', '--duration', '3 m');
    expect(duration.status).toBe(2);
    expect(duration.stderr).toContain('--duration');
    expect(cli().status).toBe(2);
  });
});
