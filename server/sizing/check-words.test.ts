import { describe, expect, it } from 'vitest';
import { checkWords } from './check-words';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';

/** SI values across the ranges the checks print: a bore, a level, a tank, a heavy bed. */
const VALUES = [0.0007, 0.0127, 0.35, 1.915, 612.5, 12_345];

describe('checkWords', () => {
  const metric = checkWords('metric');
  const us = checkWords('us');

  it('writes metric numbers as the sentences always have: litres, metres, millimetres, m², kilograms and kilopascals to three digits', () => {
    for (const v of VALUES) {
      expect(metric.volume(v)).toBe(`${threeDigits(v * 1000)} L`);
      expect(metric.length(v)).toBe(`${threeDigits(v)} m`);
      expect(metric.bore(v)).toBe(`${threeDigits(v * 1000)} mm`);
      expect(metric.area(v)).toBe(`${threeDigits(v)} m²`);
      expect(metric.mass(v)).toBe(`${threeDigits(v)} kg`);
      expect(metric.pressure(v)).toBe(`${threeDigits(v / 1000)} kPa`);
    }
  });

  it('writes US customary numbers in gallons, inches, square feet, pounds and lb/ft², converted from SI', () => {
    for (const v of VALUES) {
      expect(us.volume(v)).toBe(`${threeDigits(v / US_CUSTOMARY.gallonM3)} gal`);
      expect(us.length(v)).toBe(`${threeDigits(v / US_CUSTOMARY.inchM)} in`);
      expect(us.bore(v)).toBe(`${threeDigits(v / US_CUSTOMARY.inchM)} in`);
      expect(us.area(v)).toBe(`${threeDigits(v / US_CUSTOMARY.squareFootM2)} ft²`);
      expect(us.mass(v)).toBe(`${threeDigits(v / US_CUSTOMARY.poundKg)} lb`);
      expect(us.pressure(v)).toBe(
        `${threeDigits(v / US_CUSTOMARY.poundForcePerSquareFootPa)} lb/ft²`,
      );
    }
  });

  it('gives one US gallon, one inch and one pound as 1 of each', () => {
    expect(us.volume(US_CUSTOMARY.gallonM3)).toBe('1 gal');
    expect(us.length(US_CUSTOMARY.inchM)).toBe('1 in');
    expect(us.mass(US_CUSTOMARY.poundKg)).toBe('1 lb');
  });

  it('writes a time in minutes, or seconds under a minute, the same in both systems', () => {
    for (const s of [18.9, 59.99, 60, 555, 7200]) {
      const expected = s < 60 ? `${threeDigits(s)} s` : `${threeDigits(s / 60)} min`;
      expect(metric.time(s)).toBe(expected);
      expect(us.time(s)).toBe(expected);
    }
  });
});
