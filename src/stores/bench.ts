/**
 * The Bench's state: the program text, the machine, the run and the view
 * (cursor, zoom window, selected instruction and register). Derivations live
 * in src/lib/bench; this store holds the state, calls them and runs the
 * simulator Worker through useSimulator.
 */
import { computed, ref, shallowRef, watch } from 'vue'
import { defineStore } from 'pinia'
import { assemble } from '@shared/sim/isa'
import { checkMachine, defaultMachine, parseMachine, type Machine } from '@shared/schemas/machine'
import { DEFAULT_PRESET_ID, findPreset, PRESETS } from '@shared/sim/presets'
import type { FpReductionOrder } from '@shared/sim/run'
import { useSimulator } from '@/composables/useSimulator'
import { clampCycle, nextEvent, previousEvent, scrubberEvents } from '@/lib/bench/events'
import { exampleList, type Example } from '@shared/examples'
import { indexTrace, inspectCycle } from '@/lib/bench/inspector'
import { instructionRows } from '@/lib/bench/instructionRows'
import { issuesByField, machineSummary, matchingPreset, setField } from '@/lib/bench/machineFields'
import { dependenciesOf, firstWritten, writtenRegisters } from '@/lib/bench/registerUse'
import { raggedTail, raggedTailSentence, type NeighbourCycles } from '@/lib/bench/raggedTail'
import { staleness } from '@/lib/bench/staleness'
import { explainStalls } from '@/lib/bench/stallExplanation'
import { benchViewOf, EMPTY_VIEW, wholeCycle, wholeWindow, type BenchView, type CycleWindow } from '@/lib/bench/viewState'

const exampleFiles = import.meta.glob<string>('/examples/*.s', { query: '?raw', import: 'default', eager: true })
export const EXAMPLES: Example[] = exampleList(exampleFiles)

/** Milliseconds after the last edit before an automatic run. */
export const AUTO_RUN_DELAY = 500
/** Play speeds of the Cycle scrubber, in cycles a second. */
export const PLAY_SPEEDS = [2, 5, 10, 25, 50, 100] as const

/** Performance API marks: Run asked for, and the chart drawn for its trace (scripts/bench/ui-run.ts reads them). */
export const RUN_MARK = 'chimeline:run'
export const DRAWN_MARK = 'chimeline:chart-drawn'
export const RUN_TO_CHART = 'chimeline:run-to-chart'

export const useBenchStore = defineStore('bench', () => {
  const firstExample = EXAMPLES[0]
  const exampleId = ref<string | null>(firstExample?.id ?? null)
  const source = ref(firstExample?.source ?? '')
  const presetId = ref<string | null>(DEFAULT_PRESET_ID)
  /** What the form holds: may be invalid (then it is not run). The default preset is the schema's defaults. */
  const machineDraft = ref<Machine>(parseMachine(findPreset(DEFAULT_PRESET_ID)?.machine ?? {}))
  /** The title of the scenario on the Bench (exports are named after it), null when there is none. */
  const title = ref<string | null>(null)
  const autoRun = ref(true)
  /** The order vfredusum sums in: element order (as QEMU) or this machine's; only the rounding differs. */
  const fpOrder = ref<FpReductionOrder>('element')
  const sim = useSimulator()

  const cursor = ref<number | null>(null)
  /** The Lane chart's zoom window (not named `window`: that is the DOM's global). */
  const cycleWindow = ref<CycleWindow | null>(null)
  const selected = ref<number | null>(null)
  const selectedRegister = ref<number | null>(null)
  const subRows = ref(false)
  const showDependencies = ref(false)
  const playing = ref(false)
  const speed = ref<number>(10)
  /** performance.now() when the last run was asked for, for the Run-to-chart measurement. */
  const runStartedAt = shallowRef<number | null>(null)
  /** Runs that returned a trace: the view and the tests see a re-run by it. */
  const runs = ref(0)

  const assembled = computed(() => assemble(source.value))
  const program = computed(() => (assembled.value.ok ? assembled.value.program : null))
  const machineCheck = computed(() => checkMachine(machineDraft.value))
  const machine = computed(() => (machineCheck.value.ok ? machineCheck.value.machine : null))
  const fieldErrors = computed(() => (machineCheck.value.ok ? {} : issuesByField(machineCheck.value.issues)))
  const summary = computed(() => machineSummary(machine.value ?? machineDraft.value))
  /** The preset last chosen: what "Reset to preset" goes back to. */
  const preset = computed(() => PRESETS.find((p) => p.id === presetId.value) ?? null)
  /** The preset the machine equals now (the preset box shows it), or null for a machine of the user's own. */
  const currentPreset = computed(() => matchingPreset(machine.value, PRESETS))

  const trace = sim.trace
  /** Set while the text or the machine cannot run: what is shown is the last successful run. */
  const stale = computed(() =>
    staleness({
      hasTrace: trace.value !== null,
      programErrors: assembled.value.ok ? [] : assembled.value.errors,
      machineErrors: Object.keys(fieldErrors.value).length,
    }),
  )
  /** A request to the editor to show a place (1-based line and column); `n` tells two requests apart. */
  const reveal = ref<{ line: number; column: number; n: number } | null>(null)
  function revealInEditor(line: number, column: number): void {
    reveal.value = { line, column, n: (reveal.value?.n ?? 0) + 1 }
  }
  const traceIndex = computed(() => (trace.value ? indexTrace(trace.value) : null))
  const events = computed(() => (trace.value ? scrubberEvents(trace.value) : new Int32Array()))
  const explanation = computed(() => (trace.value ? explainStalls(trace.value) : null))
  const rows = computed(() => (trace.value ? instructionRows(trace.value) : []))
  /** Uneven lanes, and the run timed at the even vl above and below (measured in the Worker after each run). */
  const ragged = computed(() => (trace.value ? raggedTail(trace.value) : null))
  const raggedMeasured = shallowRef<NeighbourCycles[] | null>(null)
  const raggedText = computed(() => (ragged.value && trace.value ? raggedTailSentence(ragged.value, trace.value.cycles, raggedMeasured.value) : null))
  /** Per traced instruction, the registers it wrote and the groups it read (from the run's dynamic stream). */
  const registerGroups = sim.registers
  const registers = computed(() => writtenRegisters(registerGroups.value))
  const dependencies = computed(() => (selected.value === null ? [] : dependenciesOf(registerGroups.value, selected.value)))
  const cycleState = computed(() => (traceIndex.value && cursor.value !== null ? inspectCycle(traceIndex.value, cursor.value) : null))

  /**
   * Selects an instruction (null: none) the way a user does: its destination
   * register's values show in the inspector. A view put back (setView) keeps
   * its own register instead.
   */
  function select(index: number | null): void {
    selected.value = index
    const first = index === null ? null : firstWritten(registerGroups.value, index)
    if (first !== null) selectedRegister.value = first
  }

  async function run(): Promise<void> {
    if (!machine.value) return
    runStartedAt.value = performance.now()
    performance.mark(RUN_MARK)
    await sim.run(source.value, machine.value, { fpReductionOrder: fpOrder.value })
    const t = trace.value
    if (!t) return
    runs.value++
    void measureNeighbours(source.value, machine.value)
    // Keep the view when it still fits the new run (a changed machine), else start at cycle 0.
    if (cursor.value === null || cursor.value >= t.cycles) cursor.value = 0
    if (selected.value !== null && !t.instructions.some((i) => i.index === selected.value)) selected.value = null
    if (cycleWindow.value && cycleWindow.value.start >= t.cycles) cycleWindow.value = null
  }

  async function measureNeighbours(text: string, m: Machine | null): Promise<void> {
    raggedMeasured.value = null
    const t = ragged.value
    if (!t || !m) return
    const wanted = t.downVl > 0 ? [t.upVl, t.downVl] : [t.upVl]
    const measured = await sim.neighbours(text, m, t.vl, wanted)
    // A newer run may have come back meanwhile: keep only what belongs to the trace on screen.
    if (ragged.value === t) raggedMeasured.value = measured
  }

  let autoTimer: ReturnType<typeof setTimeout> | null = null
  function scheduleRun(): void {
    if (autoTimer) clearTimeout(autoTimer)
    autoTimer = setTimeout(() => {
      autoTimer = null
      if (autoRun.value && assembled.value.ok && machine.value) void run()
    }, AUTO_RUN_DELAY)
  }
  watch([source, machineDraft, fpOrder], scheduleRun, { deep: true })
  watch(autoRun, (on) => {
    if (on) scheduleRun()
  })

  function loadExample(id: string): void {
    const ex = EXAMPLES.find((e) => e.id === id)
    if (!ex) return
    exampleId.value = id
    source.value = ex.source
    cursor.value = null
    selected.value = null
    cycleWindow.value = null
  }

  function setSource(text: string): void {
    source.value = text
  }

  function applyPreset(id: string): void {
    const p = PRESETS.find((x) => x.id === id)
    if (!p) return
    presetId.value = id
    machineDraft.value = parseMachine(p.machine)
  }

  /** Back to the chosen preset's values, or the handbook defaults without one. */
  function resetMachine(): void {
    machineDraft.value = preset.value ? parseMachine(preset.value.machine) : structuredClone(defaultMachine)
  }

  function setMachineField(path: string, value: unknown): void {
    machineDraft.value = setField(machineDraft.value, path, value)
  }

  const cycles = computed(() => trace.value?.cycles ?? 0)
  function setCursor(c: number | null): void {
    cursor.value = c === null ? null : clampCycle(c, cycles.value)
  }
  function step(delta: number): void {
    setCursor((cursor.value ?? 0) + delta)
  }
  function toNextEvent(): void {
    const n = nextEvent(events.value, cursor.value ?? -1)
    if (n !== null) setCursor(n)
  }
  function toPreviousEvent(): void {
    const p = previousEvent(events.value, cursor.value ?? 0)
    if (p !== null) setCursor(p)
  }

  let playTimer: ReturnType<typeof setInterval> | null = null
  function stopTimer(): void {
    if (playTimer) clearInterval(playTimer)
    playTimer = null
  }
  function play(): void {
    stopTimer()
    if (!trace.value) return
    if ((cursor.value ?? 0) >= cycles.value - 1) setCursor(0)
    playing.value = true
    playTimer = setInterval(() => {
      if ((cursor.value ?? 0) >= cycles.value - 1) pause()
      else step(1)
    }, 1000 / speed.value)
  }
  function pause(): void {
    stopTimer()
    playing.value = false
  }
  function togglePlay(): void {
    if (playing.value) pause()
    else play()
  }
  watch(speed, () => {
    if (playing.value) play()
  })

  // The view as it is saved, shared and put in the URL: whole cycles (the chart zooms through fractions).
  const view = computed<BenchView>(() => ({
    cursor: wholeCycle(cursor.value),
    window: wholeWindow(cycleWindow.value),
    selected: selected.value,
    subRows: subRows.value,
    dependencies: showDependencies.value,
    register: selectedRegister.value,
  }))
  /** Puts a view back: from the URL, a saved scenario or a share link (older ones lack the switches and register). */
  function setView(input: Parameters<typeof benchViewOf>[0]): void {
    const v = benchViewOf(input)
    cursor.value = v.cursor
    cycleWindow.value = v.window
    selected.value = v.selected
    subRows.value = v.subRows
    showDependencies.value = v.dependencies
    selectedRegister.value = v.register
  }

  function $reset(): void {
    pause()
    if (autoTimer) clearTimeout(autoTimer)
    loadExample(firstExample?.id ?? '')
    applyPreset(DEFAULT_PRESET_ID)
    setView(EMPTY_VIEW)
    title.value = null
    autoRun.value = true
    fpOrder.value = 'element'
  }

  return {
    exampleId, title, source, presetId, machineDraft, autoRun, fpOrder, cursor, cycleWindow, selected, selectedRegister, subRows, showDependencies, playing, speed, runStartedAt, runs,
    assembled, program, machine, fieldErrors, stale, reveal, revealInEditor, summary, preset, currentPreset, trace, traceIndex, events, explanation, rows, ragged, raggedText, registerGroups, registers, dependencies, cycleState, cycles, view,
    functional: sim.functional, error: sim.error, progress: sim.progress, running: sim.running,
    run, cancel: sim.cancel, scheduleRun, loadExample, setSource, applyPreset, resetMachine, setMachineField,
    select, setCursor, step, toNextEvent, toPreviousEvent, play, pause, togglePlay, setView, $reset,
  }
})
