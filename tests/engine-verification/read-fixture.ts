import { readFileSync } from 'node:fs';
import type { z } from 'zod';

/** Reads a JSON fixture next to the verification tests and checks its shape with `schema`. */
export function readFixture<T extends z.ZodType>(name: string, schema: T): z.output<T> {
  const text = readFileSync(new URL(`./fixtures/${name}`, import.meta.url), 'utf8');
  return schema.parse(JSON.parse(text));
}
