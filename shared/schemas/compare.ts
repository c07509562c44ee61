/**
 * Side by side: two runs, each named by where it comes from, so that the
 * page's URL can carry both. A scenario version and a saved sweep's point are
 * fetched from the workspace; a program with a machine (the Bench's "Compare
 * with", a sweep not saved) travels in the URL itself.
 */
import { z } from 'zod'
import { SCENARIO_PROGRAM_MAX_LENGTH } from './scenario'

/** A program and machine carried in the URL stay below what browsers and servers accept in one (common practice: ~64 KB). */
export const COMPARE_PROGRAM_MAX_LENGTH = Math.min(SCENARIO_PROGRAM_MAX_LENGTH, 20_000)

export const compareRunSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('version'), scenarioId: z.uuid(), version: z.number().int().min(1) }).strict(),
  z.object({ kind: z.literal('point'), sweepId: z.uuid(), index: z.number().int().min(0) }).strict(),
  z
    .object({
      kind: z.literal('program'),
      /** Absent in run B: the same program as run A (the Bench's "Compare with" another machine). */
      program: z.string().min(1).max(COMPARE_PROGRAM_MAX_LENGTH, `A program carried in the link has at most ${COMPARE_PROGRAM_MAX_LENGTH} characters`).optional(),
      /** Machine fields (defaults fill the rest); validated when the run starts. */
      machine: z.record(z.string(), z.unknown()),
      label: z.string().max(120).optional(),
    })
    .strict(),
])
export type CompareRun = z.output<typeof compareRunSchema>
