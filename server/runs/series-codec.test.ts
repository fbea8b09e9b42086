import { gunzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { decodeSeries, encodeSeries, seriesToJson } from './series-codec';

const series = {
  t_s: [0, 5, 10, 12.345678901234567],
  channels: [
    { id: 'level:tank', kind: 'level' as const, where: 'tank', unit: 'm' as const, values: [0.55, 0.5499999999999999, Math.PI / 7, 1e-300] },
    { id: 'phase:bed-a', kind: 'phase' as const, where: 'bed-a', unit: '' as const, values: [0, 1, 3, Number.NaN] },
  ],
};

describe('encodeSeries / decodeSeries', () => {
  it('round-trips every double exactly, NaN included', () => {
    const decoded = decodeSeries(encodeSeries(series));
    expect(Array.from(decoded.t_s)).toEqual(series.t_s);
    expect(decoded.channels.map((c) => c.id)).toEqual(['level:tank', 'phase:bed-a']);
    expect(Array.from(decoded.channels[0]?.values ?? [])).toEqual(series.channels[0]?.values);
    expect(Number.isNaN(decoded.channels[1]?.values[3])).toBe(true);
    expect(decoded.channels[1]).toMatchObject({ kind: 'phase', where: 'bed-a', unit: '' });
  });

  it('stores one compact gzip blob whose columns are 8-byte aligned after the header', () => {
    const blob = encodeSeries(series);
    const raw = gunzipSync(blob);
    expect(raw.toString('latin1', 0, 4)).toBe('TWS1');
    const headerLength = raw.readUInt32LE(4);
    const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
    expect(raw.length).toBe(dataStart + 8 * 4 * 3);
  });

  it('compresses a long smooth series well below its raw size', () => {
    const n = 20_000;
    const t = Array.from({ length: n }, (_, i) => i * 5);
    const long = { t_s: t, channels: [{ id: 'level:tank', kind: 'level' as const, where: 'tank', unit: 'm' as const, values: t.map(() => 0.5) }] };
    expect(encodeSeries(long).length).toBeLessThan(n * 16 * 0.5);
  });

  it('refuses a channel whose length differs from the sample times', () => {
    const bad = { t_s: [0, 1], channels: [{ id: 'x', kind: 'level' as const, where: 'x', unit: 'm' as const, values: [1] }] };
    expect(() => encodeSeries(bad)).toThrow(/1 values for 2 sample times/);
  });

  it('refuses a blob of another format', () => {
    expect(() => decodeSeries(Buffer.from([1, 2, 3]))).toThrow();
  });

  it('writes NaN as null in the JSON form', () => {
    const json = seriesToJson(decodeSeries(encodeSeries(series)));
    expect(json.channels[1]?.values).toEqual([0, 1, 3, null]);
    expect(json.t_s).toEqual(series.t_s);
  });
});
