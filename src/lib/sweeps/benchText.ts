/**
 * The program text the Bench opens for a sweep point. Until the assembler
 * reads `.equ`/`.set`, the Bench gets the text with the symbols inlined (what
 * the point ran); afterwards it can get pointProgram's text as it is.
 */
import type { SweepValue } from '@shared/schemas/sweep'
import { inlineSymbols } from '@shared/sweep/inlineSymbols'
import type { ResolvedSweep } from '@shared/sweep/resolve'
import { pointProgram } from '@shared/sweep/runPoint'

export const benchTextOf = (sweep: ResolvedSweep, values: readonly SweepValue[]) => inlineSymbols(pointProgram(sweep, values))
