/**
 * Whether the chart and metrics on screen still describe the Bench: once the
 * program stops assembling (or the machine form holds an invalid value) no
 * run can happen, and what is shown is the last successful run. Then the
 * Bench dims it and says why, with the count and where the first error is.
 *
 * @example
 *   staleness({ hasTrace: true, programErrors: [{ line: 3, column: 7, code: 'x', message: 'unknown mnemonic' }], machineErrors: 0 })
 *   // { count: 1, kind: 'program', first: { line: 3, column: 7, message: 'unknown mnemonic' }, sentence: 'The program has 1 error: …' }
 */
import type { SimDiagnostic } from '@shared/sim/isa/types'

export interface Staleness {
  kind: 'program' | 'machine'
  count: number
  /** The first program error (by line, then column), or null for a machine problem. */
  first: { line: number; column: number; message: string } | null
  sentence: string
}

export interface StalenessInput {
  hasTrace: boolean
  programErrors: readonly SimDiagnostic[]
  /** How many machine fields are invalid. */
  machineErrors: number
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`

export function staleness(input: StalenessInput): Staleness | null {
  if (!input.hasTrace) return null
  if (input.programErrors.length > 0) {
    const first = [...input.programErrors].sort((a, b) => a.line - b.line || a.column - b.column)[0]!
    return {
      kind: 'program',
      count: input.programErrors.length,
      first: { line: first.line, column: first.column, message: first.message },
      sentence: `The program has ${plural(input.programErrors.length, 'error')}: the chart and numbers below are from the last run that succeeded.`,
    }
  }
  if (input.machineErrors > 0) {
    return {
      kind: 'machine',
      count: input.machineErrors,
      first: null,
      sentence: `The machine has ${plural(input.machineErrors, 'invalid field')}: the chart and numbers below are from the last run that succeeded.`,
    }
  }
  return null
}
