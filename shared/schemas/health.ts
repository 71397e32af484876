import { z } from 'zod';

/** GET /api/health answer. */
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  server: z.object({ ok: z.boolean(), uptimeSeconds: z.number() }),
  database: z.union([
    z.object({ ok: z.literal(true), version: z.string(), latencyMs: z.number() }),
    z.object({ ok: z.literal(false), message: z.string() }),
  ]),
});

export type Health = z.infer<typeof healthSchema>;
