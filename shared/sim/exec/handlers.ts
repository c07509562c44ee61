/** Every executable mnemonic and its handler. */
import type { Handler } from './handler'
import type { IndexOf, Syscalls } from './scalar'
import { scalarHandlers } from './scalar'
import { configHandlers, type ConfigListener } from './vconfig'
import { fpHandlers } from './vfp'
import { intHandlers } from './vint'
import { maskHandlers } from './vmask'
import { memoryHandlers } from './vmem'
import { permHandlers } from './vperm'
import { reductionHandlers } from './vred'
import { extHandlers } from './vext'
import { fpExtHandlers } from './vfext'
import { miscHandlers } from './vmisc'
import { estimateHandlers } from './vestimate'

/**
 * The handlers that need nothing of one run, gathered once: spreading about
 * 850 keys into one object literal took some 20 ms per run, the larger part of
 * a sweep point's set-up for a short program.
 */
const SHARED: ReadonlyMap<string, Handler> = new Map(
  Object.entries({
    ...memoryHandlers,
    ...intHandlers,
    ...fpHandlers,
    ...maskHandlers,
    ...reductionHandlers,
    ...permHandlers,
    ...extHandlers,
    ...fpExtHandlers,
    ...miscHandlers,
    ...estimateHandlers,
  }),
)

/** Every handler of one run: the shared ones plus those bound to its jump targets, system calls and vset listener. */
export function handlerTable(indexOf: IndexOf, sys: Syscalls, onConfig: ConfigListener): Map<string, Handler> {
  const table = new Map(SHARED)
  for (const [op, h] of Object.entries(scalarHandlers(indexOf, sys))) table.set(op, h)
  for (const [op, h] of Object.entries(configHandlers(onConfig))) table.set(op, h)
  return table
}
