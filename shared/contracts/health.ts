/** `GET /api/health`. */
import { z } from 'zod';

/** The health answer: whether the server and its database respond, and the app version. */
export const HealthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['ok', 'down']),
  dbKind: z.enum(['pglite', 'postgres']),
  version: z.string(),
});
/** The health answer. */
export type Health = z.infer<typeof HealthSchema>;
