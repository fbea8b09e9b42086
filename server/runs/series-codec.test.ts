import { gunzipSync, gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { decodeSeries, encodeSeries, seriesToJson } from './series-codec';

const series = {
  t_s: [0, 5, 10, 12.345678901234567],
  channels: [
    {
      id: 'level:tank',
      kind: 'level' as const,
      where: 'tank',
      unit: 'm' as const,
      values: [0.55, 0.5499999999999999, Math.PI / 7, 1e-300],
    },
    {
      id: 'phase:bed-a',
      kind: 'phase' as const,
      where: 'bed-a',
      unit: '' as const,
      values: [0, 1, 3, Number.NaN],
    },
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

  it('stores one gzip blob: header, then the Float64 columns split into byte planes', () => {
    const raw = gunzipSync(encodeSeries(series));
    expect(raw.toString('latin1', 0, 4)).toBe('TWS2');
    const headerLength = raw.readUInt32LE(4);
    const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
    expect(raw.length).toBe(dataStart + 8 * 4 * 3);
    // Byte plane 7 holds the most significant byte of each value: t_s = 5 is 0x4014000000000000.
    const count = 4 * 3;
    expect(raw[dataStart + 7 * count + 1]).toBe(0x40);
    expect(raw[dataStart + 6 * count + 1]).toBe(0x14);
  });

  it('still reads the earlier plain-column layout', () => {
    const header = Buffer.from(
      JSON.stringify({
        sampleCount: 2,
        channels: [{ id: 'level:a', kind: 'level', where: 'a', unit: 'm' }],
      }),
    );
    const dataStart = Math.ceil((8 + header.length) / 8) * 8;
    const raw = Buffer.alloc(dataStart + 32);
    raw.write('TWS1', 0, 'latin1');
    raw.writeUInt32LE(header.length, 4);
    header.copy(raw, 8);
    [0, 5, 0.25, 0.5].forEach((v, i) => raw.writeDoubleLE(v, dataStart + 8 * i));
    const decoded = decodeSeries(gzipSync(raw));
    expect(Array.from(decoded.t_s)).toEqual([0, 5]);
    expect(Array.from(decoded.channels[0]?.values ?? [])).toEqual([0.25, 0.5]);
  });

  it('compresses a long smooth series well below its raw size', () => {
    const n = 20_000;
    const t = Array.from({ length: n }, (_, i) => i * 5);
    const long = {
      t_s: t,
      channels: [
        {
          id: 'level:tank',
          kind: 'level' as const,
          where: 'tank',
          unit: 'm' as const,
          values: t.map(() => 0.5),
        },
      ],
    };
    expect(encodeSeries(long).length).toBeLessThan(n * 16 * 0.5);
  });

  it('refuses a channel whose length differs from the sample times', () => {
    const bad = {
      t_s: [0, 1],
      channels: [{ id: 'x', kind: 'level' as const, where: 'x', unit: 'm' as const, values: [1] }],
    };
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
