/**
 * The Learn lessons' claims, run against the model. Each lesson's scenario goes
 * through runPipeline; every step check, lane load, experiment and number
 * question must hold in that run, and every cycle, lane and instruction a step
 * names must exist in it. A model change that makes a note false fails here.
 *
 * The second half checks the key numbers against closed forms worked out by
 * hand from the team's timing model (handbook timing-model.md sections 1, 4, 5
 * and 8, docs/model.md "Unordered reductions"), so the lessons are not only
 * consistent with the engine but with the model it implements. The
 * derivations are in each lesson's header comment (shared/learn/*.ts).
 */
import { describe, expect, it } from 'vitest'
import { evaluateExpectations } from '../../shared/expectations/evaluate'
import type { Expectation } from '../../shared/schemas/expectation'
import { LESSONS, lessonById, questionCount } from '../../shared/learn'
import { lessonContent } from '../../shared/learn/content'
import { experimentMachine, type Lesson, type LessonExperiment } from '../../shared/learn/lesson'
import { runPipeline, type RunResult } from '../../shared/sim/run'
import { laneTiming, type TimingTrace } from '../../shared/sim/trace/types'
import { factValue } from '../../shared/walkthroughs/facts'

type OkRun = Extract<RunResult, { ok: true }>

function run(lesson: Lesson, patch: LessonExperiment['machine'] = {}): OkRun {
  const r = runPipeline({ program: lesson.program, machine: experimentMachine(lesson, { step: 0, label: '', machine: patch, checks: [] }) })
  if (!r.ok) throw new Error(`${lesson.id}: ${r.error.stage} ${r.error.message}`)
  return r
}

function failures(results: ReturnType<typeof evaluateExpectations>): string[] {
  return results.filter((r) => !r.pass).map((r) => `${r.text} (measured ${r.measured ?? 'nothing'}${r.note ? `: ${r.note}` : ''})`)
}

function position(trace: TimingTrace, instruction: number): number {
  return trace.instructions.findIndex((i) => i.index === instruction)
}

describe('Learn lessons: five, each on its own scenario, each ending with a question', () => {
  it('has the five lessons of issue 14, with distinct ids and programs', () => {
    expect(LESSONS.map((l) => l.id)).toEqual(['lanes-and-beats', 'uneven-lanes', 'chaining', 'bank-conflicts', 'reduction'])
    expect(new Set(LESSONS.map((l) => l.program)).size).toBe(5)
    expect(lessonById('chaining')?.title).toBe('Chaining on and off')
    expect(lessonById('nope')).toBeNull()
  })

  for (const lesson of LESSONS) {
    describe(lesson.id, () => {
      const r = run(lesson)
      const trace = r.trace

      it('ends with a question and asks at least one', () => {
        expect(lesson.walkthrough.steps.at(-1)?.question).toBeDefined()
        expect(questionCount(lesson)).toBeGreaterThanOrEqual(1)
      })

      it('names only cycles, lanes and instructions that exist in the run', () => {
        lesson.walkthrough.steps.forEach((s, i) => {
          expect(s.cursor, `step ${i + 1} cursor`).toBeLessThan(trace.cycles)
          if (s.window) expect(s.window.end, `step ${i + 1} window`).toBeLessThan(trace.cycles)
          if (s.highlight.lane != null) expect(s.highlight.lane, `step ${i + 1} lane`).toBeLessThan(trace.laneCount)
          if (s.highlight.instruction != null) {
            const pos = position(trace, s.highlight.instruction)
            expect(pos, `step ${i + 1} instruction`).toBeGreaterThanOrEqual(0)
            expect(trace.instructions[pos]?.isConfig, `step ${i + 1} highlights a vector instruction`).toBe(false)
          }
        })
      })

      it('every claim a step note makes holds in the run', () => {
        lesson.walkthrough.steps.forEach((s, i) => {
          expect(s.checks.length + (s.question ? 1 : 0), `step ${i + 1} has a check or a question`).toBeGreaterThan(0)
          expect(failures(evaluateExpectations(s.checks, r)), `step ${i + 1}`).toEqual([])
        })
      })

      it('every number a note sets in bold is one its step claims (a check, a lane load or an experiment of that step)', () => {
        lesson.walkthrough.steps.forEach((s, i) => {
          const claimed = new Set<number>()
          const add = (e: Expectation) => {
            if ('value' in e && typeof e.value === 'number') claimed.add(e.value)
          }
          s.checks.forEach(add)
          for (const x of lesson.experiments.filter((x) => x.step === i)) x.checks.forEach(add)
          for (const l of lesson.laneLoads.filter((l) => l.step === i)) claimed.add(l.elements).add(l.beats)
          const bold = [...s.note.matchAll(/\*\*(\d+)\*\*/g)].map((m) => Number(m[1]))
          expect(bold.filter((n) => !claimed.has(n)), `step ${i + 1}: bold numbers without a claim`).toEqual([])
        })
      })

      it('every number question has an answer in the run, and every choice a right option', () => {
        for (const s of lesson.walkthrough.steps) {
          const q = s.question
          if (!q) continue
          if (q.kind === 'number') expect(factValue(trace, q.fact).ok, q.text).toBe(true)
          else expect(q.correct).toBeLessThan(q.options.length)
          expect(q.explanation.length).toBeGreaterThan(0)
        }
      })

      it('elements and beats per lane as the notes state them', () => {
        for (const load of lesson.laneLoads) {
          expect(load.step).toBeLessThan(lesson.walkthrough.steps.length)
          const t = laneTiming(trace, position(trace, load.instruction), load.lane)
          expect({ elements: t.elements, beats: t.beats }, `#${load.instruction} lane ${load.lane}`).toEqual({ elements: load.elements, beats: load.beats })
        }
      })

      it('as scenario content (what the Bench plays), its expectations are the steps\' checks and all pass', () => {
        const content = lessonContent(lesson)
        expect(content.expectations.length).toBeGreaterThan(0)
        const played = runPipeline({ program: content.program, machine: content.machine })
        expect(failures(evaluateExpectations(content.expectations, played))).toEqual([])
      })

      for (const x of lesson.experiments) {
        it(`what a note says about "${x.label}" holds when the machine is changed so`, () => {
          expect(x.step).toBeLessThan(lesson.walkthrough.steps.length)
          expect(failures(evaluateExpectations(x.checks, run(lesson, x.machine)))).toEqual([])
        })
      }
    })
  }
})

/** n_l = max(0, ceil((vl - l) / L)) (timing model section 1). */
const elementsInLane = (vl: number, lanes: number, lane: number) => Math.max(0, Math.ceil((vl - lane) / lanes))
/** b_l = ceil(n_l / epc) (section 1). */
const beatsOf = (n: number, epc: number) => Math.ceil(n / epc)
const D = 4
/** li in cycle 0, vsetvli in 1: the first vector instruction is dispatched in 2 and reads from 3 (sections 2 and 5). */
const FIRST_READ = 3

function phase(trace: TimingTrace, instruction: number, lane: number) {
  return laneTiming(trace, position(trace, instruction), lane)
}

describe('Learn lessons against closed forms of the timing model (derived by hand)', () => {
  it('lanes and beats: n = 64 / 8 = 8; b = 8 at SEW 64, 4 at SEW 32; one add takes b + D + 2 (sections 1, 5)', () => {
    const t = run(lessonById('lanes-and-beats') as Lesson).trace
    const n = elementsInLane(64, 8, 0)
    const b64 = beatsOf(n, 1)
    const b32 = beatsOf(n, 2)
    expect([n, b64, b32]).toEqual([8, 8, 4])
    const add64 = phase(t, 1, 0)
    expect(add64.readEnd).toBe(FIRST_READ + b64 - 1)
    expect(add64.writeEnd).toBe(FIRST_READ + b64 + D) // last beat in readEnd + 1, written D later
    expect(t.instructions[position(t, 1)]?.latency).toBe(b64 + D + 2)
    // Staggered: the FP32 add starts the cycle after the lane finished reading the FP64 add.
    const add32 = phase(t, 3, 0)
    expect(add32.readStart).toBe(FIRST_READ + b64)
    expect(add32.writeEnd).toBe(FIRST_READ + b64 + b32 + D)
    expect(t.cycles).toBe(FIRST_READ + b64 + b32 + D + 1)
  })

  it('uneven lanes: 60 = 7 x 8 + 4; staggered starts #k at 3 + (k - 1) b_l; lockstep waits 1 barrier cycle a light lane and instruction; serial waits for the writes (section 4)', () => {
    const lesson = lessonById('uneven-lanes') as Lesson
    const t = run(lesson).trace
    const b = [0, 1, 2, 3, 4, 5, 6, 7].map((l) => beatsOf(elementsInLane(60, 8, l), 1))
    expect(b).toEqual([8, 8, 8, 8, 7, 7, 7, 7])
    for (const lane of [0, 7]) for (const k of [1, 2, 3]) expect(phase(t, k, lane).readStart, `lane ${lane} #${k}`).toBe(FIRST_READ + (k - 1) * (b[lane] as number))
    expect(t.cycles).toBe(FIRST_READ + 3 * 8 + D + 1)
    const lock = run(lesson, { issue: 'lockstep' }).trace
    expect(lock.metrics.stallCycles.barrier).toBe(4 * 2)
    const serial = run(lesson, { issue: 'serial' }).trace
    // Each add spans b + D + 1 cycles from its first read to its last write (3..15), and the next starts the cycle after.
    expect(serial.cycles).toBe(FIRST_READ + 3 * (8 + D + 1))
  })

  it('chaining: on, the consumer starts when the lane is free (3 + b); off, after the producer\'s last write, D + 1 later (section 5)', () => {
    const lesson = lessonById('chaining') as Lesson
    const b = 8
    const on = run(lesson).trace
    expect(phase(on, 2, 0).readStart).toBe(FIRST_READ + b)
    expect(on.cycles).toBe(FIRST_READ + 2 * b + D + 1)
    const off = run(lesson, { chaining: false }).trace
    const producerDone = FIRST_READ + b + D // 15
    // Reads v3 from producerDone + 1 = 16, its last beat b - 1 later, written D after that + 1.
    expect(phase(off, 2, 0).writeEnd).toBe(producerDone + 1 + b + D)
    expect(off.cycles - on.cycles).toBe(D + 1)
    expect(off.metrics.stallCycles.raw).toBe(8 * (producerDone + 1 - (FIRST_READ + b)))
  })

  it('bank conflicts: (1 + w) mod 6 = (7 + w) mod 6 for every w, so one refused read a lane; with 8 banks none (section 5)', () => {
    const lesson = lessonById('bank-conflicts') as Lesson
    for (let w = 0; w < 8; w++) {
      expect((1 + w) % 6).toBe((7 + w) % 6)
      expect((1 + w) % 8).not.toBe((7 + w) % 8)
    }
    const t = run(lesson).trace
    expect(t.metrics.stallCycles.bank).toBe(8 * 1)
    expect(t.cycles).toBe(8 + D + 2 + 2 + 1) // b + D + 2 after the li and vsetvli, plus the lost cycle
    expect(run(lesson, { rfBanks: 8 }).trace.cycles).toBe(8 + D + 2 + 2)
  })

  it('reduction: partial ready at 31 (beats 4..19, two pairwise levels), ring steps of hop + D, vs1[0] last; one accumulator: a beat every D (section 8)', () => {
    const lesson = lessonById('reduction') as Lesson
    const L = 8
    const hop = 1
    const t = run(lesson).trace
    const n = elementsInLane(128, L, 7) // 16
    // Last beats of the 4 accumulators in 4 + 12..15, ready D later; pairs (20, 21) -> 25, (22, 23) -> 27, then 27 + D = 31.
    const lastBeat = FIRST_READ + 1 + n - 1
    const ready = [lastBeat - 3, lastBeat - 2, lastBeat - 1, lastBeat].map((c) => c + D)
    const partial = Math.max(Math.max(ready[0] as number, ready[1] as number) + D, Math.max(ready[2] as number, ready[3] as number) + D) + D
    expect(partial).toBe(31)
    expect(phase(t, 1, 7).writeEnd).toBe(partial + 1)
    for (let lane = 1; lane < L; lane++) expect(phase(t, 1, lane).writeEnd, `lane ${lane}`).toBe(partial + 1 + (L - 1 - lane) * (hop + D))
    expect(phase(t, 1, 0).writeEnd).toBe(partial + 1 + (L - 1) * (hop + D) + D)
    const one = run(lesson, { reductionAccumulators: 1 }).trace
    expect(phase(one, 1, 7).writeEnd).toBe(FIRST_READ + 1 + D * (n - 1) + D + 1)
    // Tree: levels k = 0..2 cost 2^k hop + D after the partial leaves, then vs1[0].
    const tree = run(lesson, { interLane: 'tree' }).trace
    expect(tree.cycles).toBe(partial + 1 + [0, 1, 2].reduce((s, k) => s + 2 ** k * hop + D, 0) + D + 1)
  })
})

describe('experimentMachine', () => {
  it('replaces top-level fields and merges nested groups one level deep (the other units keep their latencies)', () => {
    const lesson = lessonById('chaining') as Lesson
    expect(experimentMachine(lesson, { step: 0, label: '', machine: { chaining: false, units: { mul: { latency: 5 } } }, checks: [] })).toEqual({
      ...lesson.machine,
      chaining: false,
      units: { fpu: { latency: 4 }, mul: { latency: 5 } },
    })
  })
})
