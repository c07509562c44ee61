/**
 * Plays one walkthrough on the Bench: each step moves the bench store's
 * cursor (a short glide), window, selection, register and switches, and
 * names a lane to highlight; a step's question is answered and checked
 * against the run on screen (shared/walkthroughs/facts.ts) before the next
 * step. Present mode is the same player shown full screen. Leaving puts the
 * Bench's view back as it was before `start`.
 *
 * The Bench view (BenchView.vue) shows the player's panel and keys while
 * `active`; any page that shows the Bench can start one:
 *
 * @example
 *   await useBenchBridge().load(content)              // the scenario's run on the Bench
 *   useWalkthroughPlayerStore().start(content.walkthroughs[0]!)
 */
import { computed, ref, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import type { Walkthrough, WalkthroughStep } from '@shared/schemas/walkthrough'
import { checkAnswer } from '@shared/walkthroughs/facts'
import type { BenchView } from '@/lib/bench/viewState'
import { mayAdvance, reachable, type Answered } from '@/lib/walkthroughs/progress'
import { GLIDE_MS, glideCycle, viewOfStep } from '@/lib/walkthroughs/steps'
import { useBenchStore } from './bench'

export interface StartOptions {
  /** The step to open on (0-based). */
  at?: number
  /** Full screen with large type (the view asks the browser for full screen). */
  present?: boolean
}

export const useWalkthroughPlayerStore = defineStore('walkthroughPlayer', () => {
  const bench = useBenchStore()
  const walkthrough = shallowRef<Walkthrough | null>(null)
  const index = ref(0)
  const answers = shallowRef<Map<number, Answered>>(new Map())
  const presenting = ref(false)
  /** Present mode's blank screen (`b`), for when the class should look at the teacher. */
  const blanked = ref(false)
  /** The view before `start`, put back by `leave`. */
  let before: BenchView | null = null
  let glide: number | null = null

  const active = computed(() => walkthrough.value !== null)
  const step = computed<WalkthroughStep | null>(() => walkthrough.value?.steps[index.value] ?? null)
  const count = computed(() => walkthrough.value?.steps.length ?? 0)
  const answered = computed(() => answers.value.get(index.value) ?? null)
  const canNext = computed(() => (walkthrough.value ? mayAdvance(walkthrough.value, index.value, answers.value) : false))
  /** The lane the step names, for the Lane chart's highlight. */
  const lane = computed(() => step.value?.highlight.lane ?? null)

  function stopGlide(): void {
    if (glide !== null) cancelAnimationFrame(glide)
    glide = null
  }

  /** Glides the cursor to `to` over GLIDE_MS (at once when the user asked for reduced motion). */
  function glideTo(to: number): void {
    stopGlide()
    const from = bench.cursor ?? to
    const reduced = typeof matchMedia === 'function' && matchMedia('(prefers-reduced-motion: reduce)').matches
    if (from === to || reduced || typeof requestAnimationFrame !== 'function') {
      bench.setCursor(to)
      return
    }
    const t0 = performance.now()
    const frame = (now: number) => {
      const t = (now - t0) / GLIDE_MS
      bench.setCursor(glideCycle(from, to, t))
      glide = t < 1 ? requestAnimationFrame(frame) : null
    }
    glide = requestAnimationFrame(frame)
  }

  function show(i: number): void {
    const w = walkthrough.value
    const s = w?.steps[i]
    if (!w || !s) return
    index.value = i
    const v = viewOfStep(s, bench.view)
    bench.pause()
    bench.setView({ ...v, cursor: bench.cursor })
    glideTo(v.cursor ?? 0)
  }

  function start(w: Walkthrough, options: StartOptions = {}): void {
    if (!walkthrough.value) before = { ...bench.view }
    walkthrough.value = w
    answers.value = new Map()
    presenting.value = options.present ?? false
    blanked.value = false
    show(Math.max(0, Math.min(w.steps.length - 1, options.at ?? 0)))
  }

  function goTo(target: number): void {
    const w = walkthrough.value
    if (!w) return
    show(reachable(w, index.value, target, answers.value))
  }
  const next = () => goTo(index.value + 1)
  const previous = () => goTo(index.value - 1)
  const first = () => goTo(0)

  /** Checks an answer against the run on the Bench; null when there is no question or no run. */
  function answer(value: number): Answered | null {
    const s = step.value
    const trace = bench.trace
    if (!s?.question || !trace) return null
    const verdict = checkAnswer(s, value, trace)
    if (!verdict) return null
    const a = { answer: value, verdict }
    answers.value = new Map(answers.value).set(index.value, a)
    return a
  }

  function setPresenting(on: boolean): void {
    presenting.value = on
    if (!on) blanked.value = false
  }

  /** Ends the walkthrough and puts the Bench's view back as it was. */
  function leave(): void {
    stopGlide()
    walkthrough.value = null
    presenting.value = false
    blanked.value = false
    answers.value = new Map()
    if (before) bench.setView(before)
    before = null
  }

  return { walkthrough, index, step, count, answers, answered, canNext, lane, active, presenting, blanked, start, goTo, next, previous, first, answer, setPresenting, leave }
})
