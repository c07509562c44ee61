import { assemble } from '../../../shared/sim/isa/assembler'
import type { Program } from '../../../shared/sim/isa/types'

/** Assembles test source or fails the test with the assembler's first diagnostic. */
export function program(text: string): Program {
  const r = assemble(text)
  if (!r.ok) throw new Error(`test program does not assemble: ${JSON.stringify(r.errors[0])}`)
  return r.program
}
