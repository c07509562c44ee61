/**
 * The scenario bundle: Chimeline's own file format for keeping and moving
 * scenarios with their whole history. Export writes it; import reads it back
 * to the same content, version by version.
 *
 * Format `chimeline-scenario-bundle`, formatVersion 1 (JSON, UTF-8):
 *   { format, formatVersion: 1, exportedAt, scenarios: [
 *       { versions: [ { number, message, author, createdAt, content, run } ... ] } ] }
 * - versions are in order, numbered 1, 2, 3 ... without gaps; the last is the
 *   scenario's current content;
 * - `content` is a ScenarioContent (title, description, tags, program,
 *   machine, initialData, view, expectations, walkthroughs) with every
 *   default filled in; bundles written before expectations or walkthroughs
 *   existed have none, and read as [];
 * - `author` is the author's display name as it was;
 * - `run` is the summary recorded when the version was saved.
 * - `suite` (optional) is present when a suite was exported: its title and
 *   the preset its runs use (null: each scenario's own machine), which
 *   `chimeline check` uses unless given --preset.
 * A later formatVersion will come with a reader for this one.
 */
import { z } from 'zod'
import { runSummarySchema, scenarioContentSchema } from './scenario'
import { PRESET_IDS } from '../sim/presets'

export const BUNDLE_FORMAT = 'chimeline-scenario-bundle'
export const BUNDLE_FORMAT_VERSION = 1
export const BUNDLE_MAX_SCENARIOS = 500
export const BUNDLE_MAX_VERSIONS = 1000

export const bundleVersionSchema = z
  .object({
    number: z.number().int().min(1),
    message: z.string().max(500),
    author: z.string().max(200),
    createdAt: z.iso.datetime(),
    content: scenarioContentSchema,
    run: runSummarySchema,
  })
  .strict()
export type BundleVersion = z.output<typeof bundleVersionSchema>

export const bundleScenarioSchema = z
  .object({
    versions: z
      .array(bundleVersionSchema)
      .min(1, 'A scenario has at least one version')
      .max(BUNDLE_MAX_VERSIONS, `At most ${BUNDLE_MAX_VERSIONS} versions per scenario`)
      .superRefine((versions, ctx) => {
        versions.forEach((v, i) => {
          if (v.number !== i + 1) ctx.addIssue({ code: 'custom', path: [i, 'number'], message: `Version ${i + 1} is numbered ${v.number}; versions are numbered 1, 2, 3 ... in order` })
        })
      }),
  })
  .strict()
export type BundleScenario = z.output<typeof bundleScenarioSchema>

export const bundleSchema = z
  .object({
    format: z.literal(BUNDLE_FORMAT, { error: `format must be "${BUNDLE_FORMAT}"` }),
    formatVersion: z.literal(BUNDLE_FORMAT_VERSION, { error: `formatVersion ${BUNDLE_FORMAT_VERSION} is the only one this Chimeline reads` }),
    exportedAt: z.iso.datetime(),
    scenarios: z.array(bundleScenarioSchema).min(1, 'A bundle holds at least one scenario').max(BUNDLE_MAX_SCENARIOS, `At most ${BUNDLE_MAX_SCENARIOS} scenarios per bundle`),
    suite: z
      .object({
        title: z.string().max(200),
        presetId: z.enum(PRESET_IDS, { error: `The preset is one of ${PRESET_IDS.join(', ')}` }).nullable(),
      })
      .strict()
      .optional(),
  })
  .strict()
export type Bundle = z.output<typeof bundleSchema>

/** POST /api/workspaces/:id/scenarios/export { scenarioIds } -> a Bundle (as an attachment). */
export const exportBodySchema = z
  .object({ scenarioIds: z.array(z.uuid('Each id is a scenario id')).min(1, 'Choose at least one scenario').max(BUNDLE_MAX_SCENARIOS, `At most ${BUNDLE_MAX_SCENARIOS} scenarios at once`) })
  .strict()
