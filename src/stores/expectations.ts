/**
 * The expectations of the scenario on the Bench and their verdicts on its
 * latest run. Evaluation is shared/expectations (the CLI runs the same code);
 * this store only feeds it what the Bench has: the Worker's trace and
 * functional results, or why the program cannot run (a program that does not
 * assemble or a machine with an invalid field is a failed run for "run fails
 * at stage ..." claims, though the Bench does not send it to the Worker).
 */
import { computed, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import { evaluateExpectations, type ExpectationRun } from '@shared/expectations/evaluate'
import { EXPECTATIONS_MAX, expectationListSchema, type Expectation, type ExpectationResult } from '@shared/schemas/expectation'
import { useBenchStore } from './bench'

export const useExpectationsStore = defineStore('expectations', () => {
  const bench = useBenchStore()
  // Replaced, never changed in place: plain objects that content snapshots can structuredClone.
  const list = shallowRef<Expectation[]>([])

  /** What the claims are checked against, or null before the first run. */
  const run = computed<ExpectationRun | null>(() => {
    if (!bench.machine) {
      const message = Object.entries(bench.fieldErrors).map(([field, m]) => `${field}: ${m}`).join('; ')
      return { ok: false, error: { stage: 'machine', code: 'invalid-machine', message } }
    }
    const asm = bench.assembled
    if (!asm.ok) {
      const first = asm.errors[0]
      return { ok: false, error: { stage: 'assemble', code: first?.code ?? 'assemble', message: first ? `line ${first.line}, column ${first.column}: ${first.message}` : 'the program does not assemble' } }
    }
    if (bench.error) return { ok: false, error: bench.error }
    if (bench.trace && bench.functional) return { ok: true, trace: bench.trace, functional: bench.functional, program: asm.program }
    return null
  })

  const results = computed<ExpectationResult[]>(() => (run.value ? evaluateExpectations(list.value, run.value) : []))
  const failed = computed(() => results.value.filter((r) => !r.pass).length)
  const full = computed(() => list.value.length >= EXPECTATIONS_MAX)

  function add(e: Expectation): void {
    if (!full.value) list.value = [...list.value, e]
  }
  function remove(index: number): void {
    list.value = list.value.filter((_, i) => i !== index)
  }
  /** Puts a scenario's expectations on the Bench (validated: a share or a version from an older client may differ). */
  function setList(expectations: unknown): void {
    const parsed = expectationListSchema.safeParse(expectations)
    list.value = parsed.success ? parsed.data : []
  }
  /** Moves the Bench's cursor to the cycle that decides a verdict and selects its instruction. */
  function reveal(result: ExpectationResult): void {
    if (!result.at) return
    bench.setCursor(result.at.cycle)
    if (result.at.instruction !== null) bench.select(result.at.instruction)
  }

  function $reset(): void {
    list.value = []
  }

  return { list, run, results, failed, full, add, remove, setList, reveal, $reset }
})
