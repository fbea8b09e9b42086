/**
 * Wall-clock times written without an offset, read in a chosen time zone: an IANA zone name
 * ("Europe/Lisbon", via the runtime's ICU data), "UTC"/"Z", or a fixed offset ("+02:00", "-0530").
 */

/** Calendar fields of a wall-clock time (month 1–12). */
export interface WallTime {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  millisecond: number;
}

/** A time zone ready to convert: a fixed offset, or an IANA zone name. */
export type TimeZoneSpec =
  { kind: 'offset'; offsetMinutes: number; label: string } | { kind: 'iana'; name: string };

const OFFSET_PATTERN = /^(?:UTC|GMT)?\s*([+-])(\d{1,2})(?::?(\d{2}))?$/i;

/**
 * Reads a time-zone setting; null when the runtime does not know it. "UTC", "GMT" and "Z" are
 * offset zero; "+02:00", "-0530", "UTC+1" are fixed offsets; anything else must be an IANA name.
 */
export function parseTimeZone(text: string): TimeZoneSpec | null {
  const trimmed = text.trim();
  if (/^(utc|gmt|z)$/i.test(trimmed)) return { kind: 'offset', offsetMinutes: 0, label: 'UTC' };
  const offset = OFFSET_PATTERN.exec(trimmed);
  if (offset) {
    const hours = Number(offset[2]);
    const minutes = Number(offset[3] ?? '0');
    if (hours > 14 || minutes > 59) return null;
    const sign = offset[1] === '-' ? -1 : 1;
    return { kind: 'offset', offsetMinutes: sign * (hours * 60 + minutes), label: trimmed };
  }
  try {
    const name = new Intl.DateTimeFormat('en-US', { timeZone: trimmed }).resolvedOptions().timeZone;
    return { kind: 'iana', name };
  } catch {
    return null;
  }
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(zone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(zone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone: zone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
    formatters.set(zone, formatter);
  }
  return formatter;
}

/** Offset of an IANA zone from UTC at the instant `epochMs`, in ms (local = UTC + offset). */
function ianaOffsetMs(zone: string, epochMs: number): number {
  const parts = formatterFor(zone).formatToParts(new Date(epochMs));
  const field = (type: Intl.DateTimeFormatPartTypes): number =>
    Number(parts.find((p) => p.type === type)?.value ?? 0);
  const asUtc = Date.UTC(
    field('year'),
    field('month') - 1,
    field('day'),
    field('hour'),
    field('minute'),
    field('second'),
  );
  return asUtc - (epochMs - (((epochMs % 1000) + 1000) % 1000));
}

/**
 * The instant (Unix ms) a wall-clock time names in `zone`. For an IANA zone the candidates are the
 * wall time read with the zone's offsets a day before and a day after (a zone changes its offset at
 * most once within two days); a candidate is valid when the zone's offset at that instant is the
 * one used. In the hour repeated when clocks go back the earlier instant wins; a time inside the
 * hour skipped when clocks go forward is read with the earlier offset, landing just after the change.
 */
export function wallTimeToEpochMs(wall: WallTime, zone: TimeZoneSpec): number {
  const naive = Date.UTC(
    wall.year,
    wall.month - 1,
    wall.day,
    wall.hour,
    wall.minute,
    wall.second,
    wall.millisecond,
  );
  if (zone.kind === 'offset') return naive - zone.offsetMinutes * 60_000;
  const dayMs = 86_400_000;
  const before = ianaOffsetMs(zone.name, naive - dayMs);
  const after = ianaOffsetMs(zone.name, naive + dayMs);
  const valid = [naive - before, naive - after].filter(
    (t) => naive - ianaOffsetMs(zone.name, t) === t,
  );
  return valid.length > 0 ? Math.min(...valid) : naive - before;
}
