import { describe, expect, it } from 'vitest';
import { timeLimitMessage } from './time-limit-message';

describe('timeLimitMessage', () => {
  it('names the limit in ms, tenths of a second or whole seconds, and says what to do', () => {
    expect(timeLimitMessage(5)).toMatch(
      /^Stopped at the 5 ms time limit for one run; shorten the duration/,
    );
    expect(timeLimitMessage(2500)).toContain('the 2.5 s time limit');
    expect(timeLimitMessage(120_000)).toContain('the 120 s time limit');
  });
});
