import { describe, expect, it } from 'vitest';
import { worstVerdict } from './worst-verdict';

describe('worstVerdict', () => {
  it('ranks fails over warning over ok', () => {
    expect(worstVerdict([{ status: 'ok' }, { status: 'fails' }, { status: 'warning' }])).toBe(
      'fails',
    );
    expect(worstVerdict([{ status: 'ok' }, { status: 'warning' }])).toBe('warning');
    expect(worstVerdict([{ status: 'ok' }])).toBe('ok');
  });
  it('is null without verdicts', () => {
    expect(worstVerdict([])).toBeNull();
  });
});
