/**
 * A Learn lesson: a scenario of our own (program and machine) and a
 * walkthrough of its run. Every number a note states is a claim the run must
 * make true: a step `check` (an expectation on this run), a `laneLoads` entry
 * (elements and beats of one lane, which no expectation kind names), or an
 * `experiments` check (the same program on a changed machine, for notes that
 * say "with 8 banks it would take 16 cycles"). tests/learn runs all of them,
 * so a model change cannot leave a lesson saying something false.
 *
 * @example
 *   const run = runPipeline({ program: lesson.program, machine: lesson.machine })
 *   evaluateExpectations(lesson.walkthrough.steps[0].checks, run)
 */
import type { Expectation, PhaseField } from '../schemas/expectation'
import type { MachineInput } from '../schemas/machine'
import { walkthroughSchema, type Walkthrough, type WalkthroughInput } from '../schemas/walkthrough'

/** Elements and beats of one instruction in one lane (timing model section 1), as a note states them. */
export interface LaneLoad {
  /** The step whose note states it. */
  step: number
  instruction: number
  lane: number
  elements: number
  beats: number
}

/** The lesson's program on a changed machine: what a note says would happen "with chaining off". */
export interface LessonExperiment {
  /** The step whose note states these numbers. */
  step: number
  /** What changes, in words (shown beside the step). */
  label: string
  /** Fields merged over the lesson's machine. */
  machine: MachineInput
  checks: Expectation[]
}

export interface Lesson {
  /** URL slug: /learn/<id>. */
  id: string
  title: string
  /** What the lesson teaches, one sentence for the list. */
  teaches: string
  program: string
  /** The lesson's machine; the fields its notes rely on are spelled out, the rest are defaults. */
  machine: MachineInput
  walkthrough: Walkthrough
  laneLoads: LaneLoad[]
  experiments: LessonExperiment[]
}

export type LessonInput = Omit<Lesson, 'walkthrough'> & { walkthrough: WalkthroughInput }

/** Validates the walkthrough once, at load, so a malformed lesson fails every test that imports it. */
export function defineLesson(input: LessonInput): Lesson {
  return { ...input, walkthrough: walkthroughSchema.parse(input.walkthrough) }
}

/** `instruction` `field` in `lane` == `value`: the claim a note makes about one phase bound. */
export function phaseIs(lane: number, instruction: number, field: PhaseField, value: number): Expectation {
  return { kind: 'phase', lane, instruction, field, op: '==', value }
}

export function cyclesAre(value: number): Expectation {
  return { kind: 'metric', metric: 'cycles', op: '==', value }
}

export function stallCyclesAre(reason: Extract<Expectation, { kind: 'stall' }>['reason'], value: number): Expectation {
  return { kind: 'stall', reason, op: '==', value }
}

/**
 * The lesson's machine with an experiment's fields over it: top-level fields
 * replace, nested groups (`units`, `fpuElementsPerCycle`) merge one level
 * deep, so `{ units: { fpu: { latency: 6 } } }` keeps the other units.
 */
export function experimentMachine(lesson: Lesson, experiment: LessonExperiment): MachineInput {
  const out: Record<string, unknown> = { ...lesson.machine }
  for (const [k, v] of Object.entries(experiment.machine)) {
    const b = out[k]
    out[k] = b && typeof b === 'object' && v && typeof v === 'object' ? { ...b, ...v } : v
  }
  return out as MachineInput
}

/** The number of questions a lesson asks (the Learn list shows it). */
export function questionCount(lesson: Lesson): number {
  return lesson.walkthrough.steps.filter((s) => s.question).length
}
