// @vitest-environment happy-dom
/**
 * Issue 10: after a zoom the Lane chart's window holds fractional cycles; the
 * view the Bench saves and shares must be whole cycles, which is all the
 * scenario schema accepts (a fraction was a 400 "Some fields are not valid").
 */
import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { scenarioViewSchema } from '@shared/schemas/scenario'
import { createShareLinkBodySchema } from '@shared/schemas/share-link'
import { wholeWindow } from '@/lib/bench/viewState'
import { useBenchStore } from '@/stores/bench'

describe('the view is taken in whole cycles', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('rounds a zoomed window outward, so every cycle shown stays in view', () => {
    expect(wholeWindow({ start: 6.388888888888888, end: 16.61111111111111 })).toEqual({ start: 6, end: 17 })
    // Float noise from a round trip through pixels is not one cycle more.
    expect(wholeWindow({ start: 2.9999999, end: 23.0000001 })).toEqual({ start: 3, end: 23 })
    // A window narrower than a cycle still spans one.
    expect(wholeWindow({ start: 4.2, end: 4.6 })).toEqual({ start: 4, end: 5 })
  })

  it('the store hands out a view that the save and share schemas accept after a zoom', () => {
    const bench = useBenchStore()
    bench.cycleWindow = { start: 6.388888888888888, end: 16.61111111111111 }
    bench.cursor = 11
    const view = bench.view
    expect(view.window).toEqual({ start: 6, end: 17 })
    expect(scenarioViewSchema.safeParse(view).success).toBe(true)
    expect(createShareLinkBodySchema.safeParse({ view }).success).toBe(true)
  })

  it('the schema refuses a fractional cycle, naming the field', () => {
    const r = scenarioViewSchema.safeParse({ cursor: null, window: { start: 6.5, end: 16 }, selected: null })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0]?.path).toEqual(['window', 'start'])
  })
})
