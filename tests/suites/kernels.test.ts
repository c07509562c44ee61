/**
 * The shipped kernel suite (server/services/demo-kernels.ts): every kernel's
 * expectations hold on the default machine, as the demo promises; the values
 * are derived by hand in that file's comments.
 */
import fs from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { defaultMachine } from '../../shared/schemas/machine'
import { scenarioContentSchema } from '../../shared/schemas/scenario'
import { KERNELS } from '../../server/services/demo-kernels'
import { checkScenario } from '../../server/services/suite-check'

const root = path.join(import.meta.dirname, '..', '..')

describe('the kernel suite', () => {
  it.each(KERNELS.map((k) => [k.title, k] as const))('%s holds on the default machine', (_, k) => {
    const content = scenarioContentSchema.parse({ title: k.title, program: fs.readFileSync(path.join(root, 'examples', k.file), 'utf8'), expectations: k.expectations })
    const r = checkScenario(content, defaultMachine)
    if (!r.ok) throw new Error('initial data')
    expect(r.check.error).toBeNull()
    expect(r.check.results.filter((x) => !x.pass).map((x) => `${x.text}: measured ${x.measured} ${x.note ?? ''}`)).toEqual([])
  })
})
