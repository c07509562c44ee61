// @vitest-environment happy-dom
/**
 * A suite run's link to the Bench (src/lib/suites/benchLink.ts): the version
 * that ran, the preset it ran on and the deciding point go into the query,
 * and come back out as the content the Bench loads.
 */
import { describe, expect, it } from 'vitest'
import { parseMachine } from '@shared/schemas/machine'
import { scenarioContentSchema } from '@shared/schemas/scenario'
import { findPreset } from '@shared/sim/presets'
import { benchQuery, linkedVersion, withLinkedPreset } from '@/lib/suites/benchLink'
import { decodeView } from '@/lib/bench/viewState'

describe('the Bench link of a suite run', () => {
  it('names the scenario, version, preset and the deciding cycle and instruction (the Bench view keys)', () => {
    const q = benchQuery('abc', 3, 'wide-16', { cycle: 54, instruction: 4 })
    expect(q).toEqual({ scenario: 'abc', version: '3', preset: 'wide-16', cycle: '54', sel: '4' })
    const view = decodeView(q as Record<string, string>)
    expect(view.cursor).toBe(54)
    expect(view.selected).toBe(4)
    expect(benchQuery('abc', null, null)).toEqual({ scenario: 'abc' })
  })

  it('opens an older version only when it is not the newest, and a known preset only', () => {
    expect(linkedVersion({ version: '2' }, 3)).toBe(2)
    expect(linkedVersion({ version: '3' }, 3)).toBeNull()
    expect(linkedVersion({ version: 'x' }, 3)).toBeNull()
    expect(linkedVersion({}, 3)).toBeNull()
    const content = scenarioContentSchema.parse({ title: 't', program: 'nop\n', machine: { lanes: 2 } })
    expect(withLinkedPreset(content, { preset: 'wide-16' }).machine).toEqual(parseMachine(findPreset('wide-16')!.machine))
    expect(withLinkedPreset(content, { preset: 'nope' })).toBe(content)
    expect(withLinkedPreset(content, {})).toBe(content)
  })
})
