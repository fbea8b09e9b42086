import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { issuesFromZod } from './issues-from-zod';

const BedSchema = z.strictObject({ id: z.string(), heightM: z.number() });
const BodySchema = z.strictObject({ name: z.string(), beds: z.array(BedSchema) });

function issuesOf(value: unknown, prefix: readonly PropertyKey[] = []) {
  const parsed = BodySchema.safeParse(value);
  if (parsed.success) throw new Error('expected the value to be refused');
  return issuesFromZod(parsed.error.issues, prefix);
}

describe('issuesFromZod', () => {
  it('reports an unknown top-level key at its own path, naming it', () => {
    expect(issuesOf({ name: 'Rig', beds: [], extra: 1 })).toEqual([
      { path: 'extra', message: expect.stringContaining('"extra"') },
    ]);
  });

  it('reports each unknown key of a nested object as its own issue at its own path', () => {
    const issues = issuesOf({
      name: 'Rig',
      beds: [
        { id: 'a', heightM: 0.3 },
        { id: 'b', heightM: 0.3, colour: 'red', shade: 2 },
      ],
    });
    expect(issues.map((issue) => issue.path)).toEqual(['beds[1].colour', 'beds[1].shade']);
    expect(issues[0]?.message).toContain('"colour"');
    expect(issues[1]?.message).toContain('"shade"');
  });

  it('puts every path under the prefix', () => {
    const issues = issuesOf({ name: 'Rig', beds: [{ id: 'a', heightM: 0.3, colour: 1 }] }, [
      'scenario',
    ]);
    expect(issues.map((issue) => issue.path)).toEqual(['scenario.beds[0].colour']);
  });

  it('passes other issues through with their path and zod message', () => {
    const issues = issuesOf({ name: 7, beds: [{ id: 'a', heightM: 'tall' }] });
    expect(issues.map((issue) => issue.path)).toEqual(['name', 'beds[0].heightM']);
    expect(issues[0]?.message).toMatch(/expected string/i);
  });

  it('gives the whole value an empty path', () => {
    expect(issuesOf('not an object')).toEqual([
      { path: '', message: expect.stringMatching(/expected object/i) },
    ]);
  });
});
