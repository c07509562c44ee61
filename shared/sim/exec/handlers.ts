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

export function handlerTable(indexOf: IndexOf, sys: Syscalls, onConfig: ConfigListener): Record<string, Handler> {
  return {
    ...scalarHandlers(indexOf, sys),
    ...configHandlers(onConfig),
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
  }
}
