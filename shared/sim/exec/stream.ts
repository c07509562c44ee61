/**
 * The dynamic instruction stream: what functional execution hands the timing
 * model. One record per executed vector instruction (vset* included, as they
 * occupy the front end), plus the count of scalar instructions before it, so
 * that the front end can be charged one cycle per scalar instruction without
 * storing each one.
 */
import type { Lmul, Sew, UnitClass, VectorShape } from '../isa/types'

export type MemoryPattern = 'unit' | 'strided' | 'indexed' | 'mask'

export interface VectorOp {
  /** Index in the dynamic stream of vector ops, from 0. */
  seq: number
  /** Index of the static instruction in Program.instructions. */
  staticIndex: number
  op: string
  text: string
  /** Scalar instructions executed since the previous vector op (front-end cycles). */
  scalarBefore: number
  /** true for vsetvli/vsetivli/vsetvl: they only occupy the front end. */
  isConfig: boolean
  /** Elements processed: vl, except vlm.v/vsm.v, which move ceil(vl / 8) bytes (eew 8). */
  vl: number
  sew: Sew
  lmul: Lmul
  /** Effective element width of the data moved: SEW, or the EEW in the mnemonic of unit-stride and strided memory ops (indexed ops move SEW-wide data, see memory.indexEew). */
  eew: Sew
  /** true when the instruction reads v0 (vm = 0): as a mask, or as the selector of vmerge/vfmerge (then every element is active). */
  masked: boolean
  unit: UnitClass
  shape: VectorShape
  /** Flops per active element: 2 for FMA forms, 1 for other FP arithmetic, 0 otherwise. */
  flopsPerElement: 0 | 1 | 2
  /** Architectural vector registers written (every register of the destination group). */
  dstRegs: number[]
  /** Architectural vector registers read, one array per source operand group (v0 for the mask is listed separately). */
  srcRegs: number[][]
  /** For memory ops. */
  memory?: {
    pattern: MemoryPattern
    isStore: boolean
    /** Byte address of each element 0..vl-1 (masked-off elements included, see `active`). */
    addresses: Float64Array
    /** Indexed ops: the width of the index elements (the data moved is SEW wide). */
    indexEew?: Sew
  }
  /** Active elements: active[i] is 1 when element i (0..vl-1) is processed, 0 when masked off; absent means all active. */
  active?: Uint8Array
  /**
   * For permutations: for each destination element i (0..vl-1), the index of the
   * vs2 element it receives, or -1 when it receives none (scalar, zero or undisturbed).
   */
  sourceIndex?: Int32Array
  /** true when the instruction produces a scalar result the front end waits for. */
  scalarResult: boolean
  /**
   * Widening, narrowing and extending ops: the element width of the destination
   * and of vs2 (a 2 x SEW destination writes twice the words per element).
   * Absent when both are SEW.
   */
  widths?: { dst: Sew; vs2: Sew }
  /** Segment loads and stores: fields moved per element (absent: 1). */
  nf?: number
  /** Whole-register loads, stores and moves: registers moved, independent of vl (then `vl` counts elements of `eew` in them). */
  wholeRegisters?: number
}

export interface DynamicStream {
  ops: VectorOp[]
  /** Scalar instructions executed after the last vector op. */
  scalarAfter: number
  /** Total dynamic instructions executed (scalar + vector). */
  dynamicCount: number
}
