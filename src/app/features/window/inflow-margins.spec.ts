import { TestBed } from '@angular/core/testing';
import type { BedInflowWindow } from '../../../../shared/contracts/sweeps';
import { InflowMargins, marginSentence } from './inflow-margins';

const LPM = 1 / 60000;
const window: BedInflowWindow = {
  bedId: 'bed-a',
  primingInflowM3PerS: 4 * LPM,
  breakingInflowM3PerS: 8 * LPM,
  spillAtRimM3PerS: 9 * LPM,
  siphonAtRimM3PerS: 12 * LPM,
  rimOverflowInflowM3PerS: 12 * LPM,
  cyclingRange: { lowM3PerS: 4 * LPM, highM3PerS: 8 * LPM },
  inflowM3PerS: 6 * LPM,
  regime: 'cycling',
  tailWaterM: 0.6,
};

describe('marginSentence', () => {
  it('says what the pump gives, the cycling range and how far inside it the pump sits', () => {
    expect(marginSentence(window, 'metric')).toBe(
      'Your pump gives bed-a 6.00 L/min; this bed cycles between 4.00 L/min and 8.00 L/min (50 % above the lowest and 25 % below the highest).',
    );
  });

  it('says when the pump gives too little or too much, and when no inflow cycles the bed', () => {
    expect(
      marginSentence({ ...window, inflowM3PerS: 3 * LPM, regime: 'spill-stall' }, 'metric'),
    ).toMatch(/too little to prime/);
    expect(
      marginSentence({ ...window, inflowM3PerS: 9 * LPM, regime: 'siphon-lock' }, 'metric'),
    ).toMatch(/too much for the siphon to break/);
    expect(
      marginSentence({ ...window, cyclingRange: null, spillAtRimM3PerS: 3 * LPM }, 'metric'),
    ).toMatch(/rim is too close/);
  });
});

describe('InflowMargins', () => {
  it('draws one bar per bed with the pump’s flow marked inside the cycling band', async () => {
    const fixture = TestBed.createComponent(InflowMargins);
    fixture.componentRef.setInput('windows', [window]);
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const rects = root.querySelectorAll('svg.bar rect');
    expect(rects.length).toBe(3);
    const marker = Number(root.querySelector('svg.bar line')?.getAttribute('x1'));
    const low = Number(rects[1]?.getAttribute('x'));
    const high = low + Number(rects[1]?.getAttribute('width'));
    expect(marker).toBeGreaterThan(low);
    expect(marker).toBeLessThan(high);
  });
});
