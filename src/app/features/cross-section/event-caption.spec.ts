import { CaptionPicker } from './caption-picker';
import type { CrossSectionEvent } from './cross-section-data';
import { eventCaption } from './event-caption';
import { formatClock } from './format-clock';

const primed: CrossSectionEvent = {
  t_s: 724.4,
  kind: 'primed',
  where: 'bed-north',
  detail: 'The siphon primed.',
  values: { spillM3PerS: 0.21e-3, primingFlowM3PerS: 0.21e-3, spillNumber: 0.7 },
};

describe('eventCaption', () => {
  it('says which bed primed, when, and the spill flow in the reader’s units', () => {
    expect(eventCaption(primed, 'metric')).toBe(
      'bed-north primed at 12:04 — spill flow reached 12.6 L/min (spill number 0.7)',
    );
    expect(eventCaption(primed, 'us')).toBe(
      'bed-north primed at 12:04 — spill flow reached 3.33 gal/min (spill number 0.7)',
    );
  });

  it('words a break with the level and the drain time, and falls back for an unknown kind', () => {
    const broke: CrossSectionEvent = {
      t_s: 3725,
      kind: 'siphon-break',
      where: 'bed-a',
      detail: '',
      values: { levelM: 0.025, drainDurationS: 150 },
    };
    expect(eventCaption(broke, 'metric')).toBe(
      'bed-a: the siphon broke at 1:02:05 — air got in at 0.025 m after 2 min 30 s of draining',
    );
    expect(eventCaption({ ...broke, kind: 'odd-thing', values: {} }, 'metric')).toBe(
      'bed-a: odd-thing at 1:02:05',
    );
    expect(eventCaption({ ...primed, values: {} }, 'metric')).toContain('reached –');
  });
});

describe('formatClock', () => {
  it('writes minutes and seconds under an hour, hours beyond, and tenths on request', () => {
    expect(formatClock(0)).toBe('0:00');
    expect(formatClock(59.6)).toBe('1:00');
    expect(formatClock(3600)).toBe('1:00:00');
    expect(formatClock(402.46, true)).toBe('6:42.5');
    expect(formatClock(-3)).toBe('0:00');
  });
});

describe('CaptionPicker', () => {
  it('joins the events of one instant and shows the latest recent instant only', () => {
    const pump = { t_s: 0, kind: 'pump-on', where: 'pump', detail: '' };
    const dry = { t_s: 0, kind: 'pump-dry', where: 'pump', detail: '' };
    const picker = new CaptionPicker([pump, dry, primed], 'metric');
    expect(picker.times()).toEqual([0, 724.4]);
    expect(picker.at(5, 60)?.text).toBe(
      'pump starts at 0:00; pump runs dry at 0:00: its intake is out of the water',
    );
    expect(picker.at(100, 60)).toBeNull();
    expect(picker.at(730, 60)).toEqual({
      key: 1,
      timeS: 724.4,
      text: eventCaption(primed, 'metric'),
      where: 'bed-north',
    });
  });
});
