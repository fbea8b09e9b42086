import { BREAK_SHOWN_S, BedPhaseTrack, PRIMING_SHOWN_S } from './bed-phase';
import type { CrossSectionEvent } from './cross-section-data';
import { SeriesReader } from './series-reader';

const event = (t_s: number, kind: string, where = 'bed-a'): CrossSectionEvent => ({
  t_s,
  kind,
  where,
  detail: '',
});

describe('BedPhaseTrack', () => {
  it('reads the phase from the phase channel, held from the last sample', () => {
    const reader = new SeriesReader({
      t_s: [0, 100, 200, 300],
      channels: [{ id: 'phase:bed-a', values: [0, 1, 3, 0] }],
    });
    const track = new BedPhaseTrack('bed-a', reader, []);
    expect(track.phaseAt(50).phase).toBe('filling');
    expect(track.phaseAt(150).phase).toBe('spilling');
    expect(track.phaseAt(250).phase).toBe('siphoning');
    expect(track.phaseAt(350).phase).toBe('filling');
  });

  it("corrects a thinned channel with the bed's own events, exact in time", () => {
    const reader = new SeriesReader({
      t_s: [0, 100, 200],
      channels: [{ id: 'phase:bed-a', values: [0, 0, 0] }],
    });
    const track = new BedPhaseTrack('bed-a', reader, [
      event(120, 'spill-start'),
      event(150, 'primed'),
      event(180, 'siphon-break'),
      event(130, 'primed', 'bed-b'),
    ]);
    expect(track.phaseAt(119).phase).toBe('filling');
    expect(track.phaseAt(125).phase).toBe('spilling');
    expect(track.phaseAt(150 + PRIMING_SHOWN_S + 1).phase).toBe('siphoning');
    expect(track.phaseAt(180 + BREAK_SHOWN_S + 1).phase).toBe('filling');
    // A sample after the events wins over them.
    expect(track.phaseAt(201).phase).toBe('filling');
  });

  it('names priming and break for a few seconds after their instant, with the time since', () => {
    const reader = new SeriesReader({
      t_s: [0, 50, 50, 90, 90, 200],
      channels: [{ id: 'phase:bed-a', values: [1, 2, 3, 4, 0, 0] }],
    });
    const track = new BedPhaseTrack('bed-a', reader, [
      event(50, 'primed'),
      event(90, 'siphon-break'),
    ]);
    expect(track.phaseAt(50)).toEqual({ phase: 'priming', sinceS: 0 });
    expect(track.phaseAt(53)).toEqual({ phase: 'priming', sinceS: 3 });
    expect(track.phaseAt(50 + PRIMING_SHOWN_S).phase).toBe('siphoning');
    expect(track.phaseAt(92)).toEqual({ phase: 'break', sinceS: 2 });
    expect(track.phaseAt(90 + BREAK_SHOWN_S).phase).toBe('filling');
  });
});
