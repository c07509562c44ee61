/**
 * Writes the shipped kernel suite (server/services/demo-kernels.ts) as a
 * bundle on stdout, the file the demo workspace's "Kernels" suite exports,
 * without a server: `npx tsx scripts/kernel-suite-bundle.ts > kernels.json`,
 * then `npx chimeline check kernels.json` or `npx chimeline report ...`.
 */
import { BUNDLE_FORMAT, BUNDLE_FORMAT_VERSION, bundleSchema } from '../shared/schemas/bundle'
import { KERNEL_SUITE_TITLE, KERNELS, kernelContent } from '../server/services/demo-kernels'
import { computeRunSummary } from '../server/services/scenario-run'

const now = new Date().toISOString()
const bundle = bundleSchema.parse({
  format: BUNDLE_FORMAT,
  formatVersion: BUNDLE_FORMAT_VERSION,
  exportedAt: now,
  suite: { title: KERNEL_SUITE_TITLE, presetId: null },
  scenarios: KERNELS.map((k) => {
    const content = kernelContent(k)
    const run = computeRunSummary(content)
    if (!run.ok) throw new Error(`${k.title}: initial data`)
    return { versions: [{ number: 1, message: 'The kernel with its expectations on the default machine', author: 'Chimeline', createdAt: now, content, run: run.run }] }
  }),
})
process.stdout.write(`${JSON.stringify(bundle, null, 2)}\n`)
