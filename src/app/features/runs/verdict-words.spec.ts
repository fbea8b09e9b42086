import type { BedSummary, Verdict } from '../../../../shared/contracts/runs';
import {
  bedSentence,
  durationWords,
  readVerdict,
  statusWords,
  verdictSentence,
} from './verdict-words';

const verdict = (check: string, value: Verdict['value'], limit: Verdict['limit']): Verdict => ({
  check,
  status: 'ok',
  value,
  limit,
  source: 'common practice',
});

const bed = (
  state: BedSummary['state'],
  cycles = 0,
  periodMean_s: number | null = null,
): BedSummary => ({
  id: 'bed-a',
  cycles,
  periodMean_s,
  floodMean_s: null,
  drainMean_s: null,
  highLevel_m: null,
  lowLevel_m: null,
  state,
});

describe('verdict words', () => {
  it("shows a minimum-level check in the reader's length unit", () => {
    const reading = readVerdict(
      verdict('tank: stays above its fish-safe minimum level (m)', 0.4572, 0.4),
      'us',
    );
    expect(reading).toMatchObject({
      title: 'Tank: stays above its fish-safe minimum level',
      value: '18.0 in',
      limit: '15.7 in',
    });
  });

  it('shows litres lost as US gallons for US customary readers', () => {
    const reading = readVerdict(verdict('water lost through leaks (L)', 75.7, 0), 'us');
    expect(reading.value).toBe('20.0 gal');
  });

  it('writes a regime in words and keeps a phrase whose brackets are not a unit', () => {
    const reading = readVerdict(
      verdict('bed-a: drains and refills', 'spill-stall', 'cycling'),
      'metric',
    );
    expect(reading.value).toBe('stalls spilling (never primes)');
    const period = readVerdict(
      verdict('bed-a: cycle period (a few floods per hour)', 7.3, '5–60 min'),
      'metric',
    );
    expect(period.title).toBe('Bed-a: cycle period (a few floods per hour)');
    expect(period.value).toBe('7.3 min');
  });

  it('says a pump never ran dry rather than "0 s"', () => {
    expect(verdictSentence(verdict('pump: never runs dry (s dry)', 0, 0), 'metric')).toBe(
      'Pump: never runs dry: never (limit never).',
    );
  });

  it('describes each bed regime in one sentence', () => {
    expect(bedSentence(bed('cycling', 6, 540))).toBe(
      'bed-a floods and drains every 9 min (6 cycles).',
    );
    expect(bedSentence(bed('siphon-lock'))).toContain('never breaks');
    expect(bedSentence(bed('spill-stall'))).toContain('never starts its siphon');
  });

  it('names the worst status in words', () => {
    expect(statusWords('fails').label).toBe('Fails a check');
    expect(statusWords(null).label).toBe('Not run yet');
  });

  it('writes durations in the unit people use for them', () => {
    expect(durationWords(45)).toBe('45 s');
    expect(durationWords(252)).toBe('4.2 min');
    expect(durationWords(5400)).toBe('90 min');
    expect(durationWords(9000)).toBe('2.5 h');
  });
});
