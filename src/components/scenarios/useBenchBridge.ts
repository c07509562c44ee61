/**
 * The one place where scenarios meet the Bench's store: what to save is read
 * from it, and an opened (or restored, or shared) scenario is written into it.
 * The bench store owns its state; this only uses its public refs and actions.
 */
import { parseMachine } from '@shared/schemas/machine'
import type { ScenarioContent } from '@shared/schemas/scenario'
import { contentFrom, type BenchFields, type BenchSnapshot } from '@/lib/scenarios/content'
import { useBenchStore } from '@/stores/bench'
import { useExpectationsStore } from '@/stores/expectations'
import { useWalkthroughsStore } from '@/stores/walkthroughs'

export const NEW_SCENARIO_FIELDS: Omit<ScenarioContent, BenchFields> = {
  title: '',
  description: '',
  tags: [],
  initialData: [],
}

export function useBenchBridge() {
  const bench = useBenchStore()
  const expectations = useExpectationsStore()
  const walkthroughs = useWalkthroughsStore()

  /** The Bench as it is now, or null while its machine form has an invalid value (nothing valid to save). */
  function snapshot(): BenchSnapshot | null {
    if (!bench.machine) return null
    return { program: bench.source, machine: bench.machine, view: { ...bench.view }, expectations: expectations.list, walkthroughs: walkthroughs.list }
  }

  function content(base: Omit<ScenarioContent, BenchFields>): ScenarioContent | null {
    const s = snapshot()
    return s ? contentFrom(base, s) : null
  }

  /** Puts a scenario on the Bench at its saved view, and runs it. */
  async function load(c: ScenarioContent): Promise<void> {
    bench.pause()
    bench.exampleId = null
    bench.presetId = null
    bench.title = c.title
    bench.setSource(c.program)
    bench.machineDraft = parseMachine(c.machine)
    bench.setView(c.view)
    expectations.setList(c.expectations)
    walkthroughs.setList(c.walkthroughs)
    await bench.run()
    // A run keeps a view that fits the trace; set it again in case the run moved a cursor the trace now holds.
    bench.setView(c.view)
  }

  /**
   * Remembers the Bench as the user has it (program, machine draft, preset,
   * example, title, view, expectations, walkthroughs) and returns what puts
   * it back: a page that borrows the Bench (a share link, a lesson) calls it
   * when it leaves.
   */
  function keep(): () => void {
    const before = {
      source: bench.source,
      machineDraft: bench.machineDraft,
      presetId: bench.presetId,
      exampleId: bench.exampleId,
      title: bench.title,
      view: { ...bench.view },
      expectations: expectations.list,
      walkthroughs: walkthroughs.list,
    }
    return () => {
      bench.pause()
      expectations.setList(before.expectations)
      walkthroughs.setList(before.walkthroughs)
      bench.exampleId = before.exampleId
      bench.title = before.title
      bench.presetId = before.presetId
      bench.setSource(before.source)
      bench.machineDraft = before.machineDraft
      bench.setView(before.view)
    }
  }

  return { bench, snapshot, content, load, keep }
}
