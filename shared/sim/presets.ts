/**
 * Ready-made machines of our own. Each lists only what differs from the
 * handbook defaults; parseMachine fills in the rest.
 */
import type { MachineInput } from '../schemas/machine'

export interface Preset {
  id: string
  name: string
  description: string
  machine: MachineInput
}

/** The machine every new thing starts on: the Bench, imports, the CLI, a new workspace. */
export const DEFAULT_PRESET_ID = 'default-8'

export const PRESETS: readonly Preset[] = [
  {
    id: DEFAULT_PRESET_ID,
    name: 'Default 8-lane',
    description: 'The handbook defaults: 8 lanes, VLEN 8192 (128 FP64 elements a register), 6 single-port banks a lane, one memory port with 512-bit buses.',
    machine: {},
  },
  {
    id: 'starter-4',
    name: 'Starter 4-lane',
    description: 'A small unit to learn on: 4 lanes, VLEN 4096, the default register file and memory.',
    machine: { lanes: 4, vlen: 4096 },
  },
  {
    id: 'long-vector-8',
    name: 'Long-vector 8-lane',
    description: '8 lanes with VLEN 16384 (256 FP64 elements a register), 8 banks a lane.',
    machine: { lanes: 8, vlen: 16384, rfBanks: 8 },
  },
  {
    id: 'wide-16',
    name: 'Wide 16-lane',
    description: '16 lanes, two memory ports with 1024-bit buses, 8 banks a lane.',
    machine: { lanes: 16, vlen: 16384, rfBanks: 8, memoryPorts: 2, loadBusBits: 1024, storeBusBits: 1024 },
  },
  {
    id: 'textbook-1',
    name: 'Textbook single lane',
    description:
      'One lane, chaining, one memory pipeline moving one FP64 element a cycle, start-up latencies like a classic vector machine (from memory: load 12, FP add 6, multiply 7), a register file with ports to spare.',
    machine: {
      lanes: 1,
      vlen: 4096,
      chaining: true,
      memoryPorts: 1,
      memLatency: 12,
      loadBusBits: 64,
      storeBusBits: 64,
      rfBanks: 16,
      rfPortsPerBank: 4,
      units: { alu: { latency: 1 }, mul: { latency: 7 }, fpu: { latency: 6 }, div: { cyclesPerBeat: 20 } },
    },
  },
]

/** A preset by id, or undefined. */
export function findPreset(id: string): Preset | undefined {
  return PRESETS.find((p) => p.id === id)
}

export const PRESET_IDS = PRESETS.map((p) => p.id) as [string, ...string[]]
