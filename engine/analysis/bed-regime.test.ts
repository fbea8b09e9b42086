import { describe, expect, it } from 'vitest';
import { bedRegime } from './bed-regime';

describe('bedRegime', () => {
  const beds = [
    { id: 'a', state: 'cycling' as const },
    { id: 'b', state: 'siphon-lock' as const },
  ];

  it('gives the bed state from the summary when nothing spilled over its rim', () => {
    const events = [{ kind: 'rim-overflow', where: 'tank' }];
    expect(bedRegime({ summary: { beds }, events }, 'a')).toBe('cycling');
    expect(bedRegime({ summary: { beds }, events }, 'b')).toBe('siphon-lock');
  });

  it('reports a rim overflow of the bed itself above its state', () => {
    const events = [
      { kind: 'primed', where: 'b' },
      { kind: 'rim-overflow', where: 'b' },
    ];
    expect(bedRegime({ summary: { beds }, events }, 'b')).toBe('rim-overflow');
  });

  it('answers null for a bed the run does not have', () => {
    expect(bedRegime({ summary: { beds }, events: [] }, 'c')).toBeNull();
  });
});
