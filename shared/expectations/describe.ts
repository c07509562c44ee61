/**
 * A claim in words, the same on the Bench, in the CLI's lines and in JUnit
 * test names: `cycles <= 120`, `lane 3, instruction 5, writeEnd == 47`.
 */
import type { Expectation } from '../schemas/expectation'

/** Lists longer than this are shortened in a description (the claim keeps them all). */
const SHOWN_VALUES = 8

export function valueList(values: string[]): string {
  if (values.length <= SHOWN_VALUES) return `[${values.join(', ')}]`
  return `[${values.slice(0, SHOWN_VALUES).join(', ')}, … ${values.length} values]`
}

export function describeExpectation(e: Expectation): string {
  switch (e.kind) {
    case 'metric':
      return `${e.metric} ${e.op} ${e.value}`
    case 'stall':
      return `stall.${e.reason} ${e.op} ${e.value}`
    case 'phase':
      return `lane ${e.lane}, instruction ${e.instruction}, ${e.field} ${e.op} ${e.value}`
    case 'latency':
      return `instruction ${e.instruction} latency ${e.op} ${e.value}`
    case 'register':
      return `register v${e.register} (${e.type}) equals ${valueList(e.values)}${ulps(e.toleranceUlps)}`
    case 'memory':
      return `memory at label ${e.label} (${e.type} x ${e.values.length}) equals ${valueList(e.values)}${ulps(e.toleranceUlps)}`
    case 'fails':
      return `run fails at stage ${e.stage}${e.code ? ` with code ${e.code}` : ''}`
  }
}

function ulps(n: number | undefined): string {
  return n ? ` within ${n} ulp${n === 1 ? '' : 's'}` : ''
}
