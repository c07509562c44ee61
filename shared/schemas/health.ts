import { z } from 'zod'

/** GET /api/health */
export const healthResponseSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  database: z.enum(['up', 'down']),
})
export type HealthResponse = z.infer<typeof healthResponseSchema>
