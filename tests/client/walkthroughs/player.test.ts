// @vitest-environment happy-dom
/**
 * The walkthrough player on the bench store: a step moves the Bench's view
 * (cursor, window, selection, switches) and names its lane; a question holds
 * the student until answered, the answer is checked against the run on the
 * Bench; leaving puts the view back as it was before the walkthrough.
 * The run is a real one (the shared pipeline), put where the Worker's would go.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { parseMachine } from '@shared/schemas/machine'
import { walkthroughSchema } from '@shared/schemas/walkthrough'
import { runPipeline } from '@shared/sim/run'
import { useBenchStore } from '@/stores/bench'
import { useWalkthroughPlayerStore } from '@/stores/walkthroughPlayer'

// Four independent vfadd.vv on 4 lanes: a short run of our own.
const PROGRAM = `  li t0, 16
  vsetvli t0, t0, e32, m1, ta, ma
  vfadd.vv v1, v2, v3
  vfadd.vv v4, v5, v6
  vfadd.vv v7, v8, v9
  vfadd.vv v10, v11, v12
`

describe('the walkthrough player', () => {
  beforeEach(() => {
    setActivePinia(createPinia())
    // No animation frames: the cursor lands at once (as with prefers-reduced-motion).
    vi.stubGlobal('requestAnimationFrame', undefined)
  })
  afterEach(() => vi.unstubAllGlobals())

  function benchWithRun() {
    const r = runPipeline({ program: PROGRAM, machine: parseMachine({ lanes: 4, vlen: 512 }) })
    if (!r.ok) throw new Error(r.error.message)
    const bench = useBenchStore()
    bench.trace = r.trace
    bench.setView({ cursor: 2, window: null, selected: null, subRows: false, dependencies: true, register: 3 })
    return { bench, trace: r.trace }
  }

  it('shows each step on the Bench, holds at a question until answered, checks it against the run, and leaves the Bench as it was', () => {
    const { bench, trace } = benchWithRun()
    const last = trace.cycles - 1
    const w = walkthroughSchema.parse({
      title: 'Four adds',
      steps: [
        { cursor: 1, window: { start: 0, end: 6 }, highlight: { instruction: 2, lane: 3 }, subRows: true, note: 'The first add.' },
        { cursor: last, note: 'The end.', question: { kind: 'number', text: 'How many cycles?', fact: { kind: 'metric', metric: 'cycles' }, explanation: 'The ruler.' } },
        { cursor: 0, note: 'Back to the start.' },
      ],
    })
    const player = useWalkthroughPlayerStore()
    player.start(w)
    expect(player.active).toBe(true)
    expect(bench.view).toEqual({ cursor: 1, window: { start: 0, end: 6 }, selected: 2, subRows: true, dependencies: true, register: 3 })
    expect(player.lane).toBe(3)

    player.next()
    expect(player.index).toBe(1)
    expect(bench.cursor).toBe(last)
    expect(bench.selected).toBeNull() // the step names no instruction: no stale highlight
    expect(player.lane).toBeNull()
    expect(player.canNext).toBe(false)
    player.next()
    expect(player.index).toBe(1) // held at the question

    const wrong = player.answer(trace.cycles + 5)
    expect(wrong?.verdict).toEqual({ right: false, expected: String(trace.cycles), explanation: 'The ruler.' })
    expect(player.canNext).toBe(true)
    player.next()
    expect(player.index).toBe(2)
    expect(bench.cursor).toBe(0)
    player.first()
    expect(player.index).toBe(0)

    player.leave()
    expect(player.active).toBe(false)
    expect(bench.view).toEqual({ cursor: 2, window: null, selected: null, subRows: false, dependencies: true, register: 3 })
  })

  it('a right answer is right; Present mode and its blank screen end with the walkthrough', () => {
    const { trace } = benchWithRun()
    const w = walkthroughSchema.parse({ title: 't', steps: [{ cursor: 0, question: { kind: 'choice', text: 'Which?', options: ['a', 'b'], correct: 1 } }, { cursor: 1 }] })
    const player = useWalkthroughPlayerStore()
    player.start(w, { present: true })
    expect(player.presenting).toBe(true)
    player.blanked = true
    expect(player.answer(1)?.verdict.right).toBe(true)
    expect(trace.cycles).toBeGreaterThan(1)
    player.leave()
    expect(player.presenting).toBe(false)
    expect(player.blanked).toBe(false)
  })
})
