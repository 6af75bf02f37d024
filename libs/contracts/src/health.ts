import { z } from 'zod';

/** Answer of `GET /api/health` when the service and its database answer. */
export const healthResponseSchema = z.object({
  status: z.literal('ok'),
  database: z.literal('ok'),
});
export type HealthResponse = z.infer<typeof healthResponseSchema>;
