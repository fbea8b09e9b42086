import { describe, expect, it } from 'vitest';
import { parseTimeZone, wallTimeToEpochMs, type WallTime } from './zoned-time';

const wall = (iso: string): WallTime => {
  const [date = '', time = '00:00:00'] = iso.split('T');
  const [year, month, day] = date.split('-').map(Number);
  const [hour, minute, second] = time.split(':').map(Number);
  return {
    year: year ?? 0,
    month: month ?? 0,
    day: day ?? 0,
    hour: hour ?? 0,
    minute: minute ?? 0,
    second: second ?? 0,
    millisecond: 0,
  };
};

const at = (iso: string, zone: string): string => {
  const spec = parseTimeZone(zone);
  if (!spec) throw new Error(`unknown zone ${zone}`);
  return new Date(wallTimeToEpochMs(wall(iso), spec)).toISOString();
};

describe('parseTimeZone', () => {
  it('reads UTC, fixed offsets and IANA names, and refuses unknown names', () => {
    expect(parseTimeZone('UTC')).toEqual({ kind: 'offset', offsetMinutes: 0, label: 'UTC' });
    expect(parseTimeZone('+05:30')).toMatchObject({ kind: 'offset', offsetMinutes: 330 });
    expect(parseTimeZone('-0800')).toMatchObject({ kind: 'offset', offsetMinutes: -480 });
    expect(parseTimeZone('UTC+1')).toMatchObject({ kind: 'offset', offsetMinutes: 60 });
    expect(parseTimeZone('Europe/Lisbon')).toEqual({ kind: 'iana', name: 'Europe/Lisbon' });
    expect(parseTimeZone('Mars/Olympus')).toBeNull();
    expect(parseTimeZone('+15:00')).toBeNull();
  });
});

describe('wallTimeToEpochMs', () => {
  it('applies a fixed offset', () => {
    expect(at('2024-05-31T14:00:00', '+02:00')).toBe('2024-05-31T12:00:00.000Z');
    expect(at('2024-05-31T14:00:00', '-05:30')).toBe('2024-05-31T19:30:00.000Z');
  });

  it('uses summer and winter offsets of an IANA zone', () => {
    // Lisbon: WEST (UTC+1) in summer, WET (UTC+0) in winter (IANA tz database).
    expect(at('2024-07-01T12:00:00', 'Europe/Lisbon')).toBe('2024-07-01T11:00:00.000Z');
    expect(at('2024-01-15T12:00:00', 'Europe/Lisbon')).toBe('2024-01-15T12:00:00.000Z');
    expect(at('2024-07-01T12:00:00', 'America/New_York')).toBe('2024-07-01T16:00:00.000Z');
  });

  it('reads the hour repeated when clocks go back as its first occurrence', () => {
    // New York left daylight time at 2024-11-03 02:00 EDT = 06:00Z; 01:30 occurs at 05:30Z and 06:30Z.
    expect(at('2024-11-03T01:30:00', 'America/New_York')).toBe('2024-11-03T05:30:00.000Z');
  });

  it('reads a time in the skipped hour with the offset before the change', () => {
    // 2024-03-10 02:30 does not exist in New York; read with EST (−5 h) it is 07:30Z = 03:30 EDT.
    expect(at('2024-03-10T02:30:00', 'America/New_York')).toBe('2024-03-10T07:30:00.000Z');
  });
});
