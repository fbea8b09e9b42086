import { describe, expect, it } from 'vitest';
import { parseTimeValue, type ConcreteTimeFormat } from './parse-time-value';
import { parseTimeZone, type TimeZoneSpec } from './zoned-time';

const zone = (name: string): TimeZoneSpec => {
  const spec = parseTimeZone(name);
  if (!spec) throw new Error(name);
  return spec;
};
const utc = zone('UTC');

const iso = (text: string, format: ConcreteTimeFormat, z: TimeZoneSpec = utc): string => {
  const value = parseTimeValue(text, format, z);
  if (value.kind !== 'instant') throw new Error(`${text}: ${JSON.stringify(value)}`);
  return new Date(value.epochMs).toISOString();
};

describe('parseTimeValue', () => {
  it('reads ISO 8601 with Z, with an offset, with a space, without seconds and with a fraction', () => {
    expect(iso('2024-05-31T14:03:22Z', 'iso')).toBe('2024-05-31T14:03:22.000Z');
    expect(iso('2024-05-31T14:03:22+02:00', 'iso')).toBe('2024-05-31T12:03:22.000Z');
    expect(iso('2024-05-31 14:03', 'iso')).toBe('2024-05-31T14:03:00.000Z');
    expect(iso('2024-05-31T14:03:22.25', 'iso')).toBe('2024-05-31T14:03:22.250Z');
  });

  it('reads times without an offset in the chosen zone, and lets an offset in the text win', () => {
    expect(iso('2024-05-31 14:00:00', 'iso', zone('Europe/Lisbon'))).toBe(
      '2024-05-31T13:00:00.000Z',
    );
    expect(iso('2024-05-31 14:00:00Z', 'iso', zone('Europe/Lisbon'))).toBe(
      '2024-05-31T14:00:00.000Z',
    );
  });

  it('reads day/month/year, month/day/year and year/month/day with their separators', () => {
    expect(iso('31/05/2024 14:03:22', 'dmy')).toBe('2024-05-31T14:03:22.000Z');
    expect(iso('31.05.2024 14:03', 'dmy')).toBe('2024-05-31T14:03:00.000Z');
    expect(iso('05/31/2024 2:03:22 PM', 'mdy')).toBe('2024-05-31T14:03:22.000Z');
    expect(iso('05/31/24 12:00:00 AM', 'mdy')).toBe('2024-05-31T00:00:00.000Z');
    expect(iso('2024/05/31 14:03:22', 'ymd')).toBe('2024-05-31T14:03:22.000Z');
  });

  it('refuses impossible dates and says which reading it tried', () => {
    const value = parseTimeValue('31/02/2024 10:00', 'dmy', utc);
    expect(value).toEqual({
      kind: 'error',
      reason: expect.stringContaining('not a calendar date read as dmy'),
    });
    expect(parseTimeValue('05/31/2024', 'dmy', utc).kind).toBe('error');
    expect(parseTimeValue('2024-13-01', 'iso', utc).kind).toBe('error');
    expect(parseTimeValue('', 'iso', utc)).toEqual({ kind: 'error', reason: 'time is empty' });
  });

  it('reads Unix seconds and milliseconds', () => {
    expect(iso('1717164202', 'epoch-s')).toBe('2024-05-31T14:03:22.000Z');
    expect(iso('1717164202500', 'epoch-ms')).toBe('2024-05-31T14:03:22.500Z');
  });

  it('reads elapsed seconds as numbers, with a decimal comma, and as h:mm:ss', () => {
    expect(parseTimeValue('12.5', 'elapsed-s', utc)).toEqual({ kind: 'elapsed', seconds: 12.5 });
    expect(parseTimeValue('12,5', 'elapsed-s', utc, ',')).toEqual({
      kind: 'elapsed',
      seconds: 12.5,
    });
    expect(parseTimeValue('1:02:03.5', 'elapsed-s', utc)).toEqual({
      kind: 'elapsed',
      seconds: 3723.5,
    });
    expect(parseTimeValue('02:03', 'elapsed-s', utc)).toEqual({ kind: 'elapsed', seconds: 123 });
    expect(parseTimeValue('soon', 'elapsed-s', utc).kind).toBe('error');
  });
});
