/**
 * The contract between the front end (parse/assemble/decode), functional
 * execution and the timing model. Keep it small: every stage of the pipeline
 * text -> isa -> exec -> timing depends on these shapes.
 */

/** A position in the user's source text, 1-based line and column. */
export interface SourceLoc {
  line: number
  column: number
}

/** Every user-visible problem carries where it is and a plain message. */
export interface SimDiagnostic extends SourceLoc {
  message: string
  /** Stable machine-readable code, e.g. 'unknown-mnemonic', 'imm-range'. */
  code: string
}

export type Sew = 8 | 16 | 32 | 64
/** LMUL as a number: 1/8, 1/4, 1/2, 1, 2, 4, 8. */
export type Lmul = 0.125 | 0.25 | 0.5 | 1 | 2 | 4 | 8

/** The functional unit class the timing model charges an instruction to. */
export type UnitClass = 'none' | 'alu' | 'mul' | 'fpu' | 'div' | 'load' | 'store'

/**
 * How the timing model moves data for an instruction, beyond the plain
 * element-wise case.
 */
export type VectorShape =
  | 'elementwise' // vd[i] = f(vs2[i], vs1[i] or scalar): lane-local
  | 'reduction' // unordered reduction: lane partials, then the inter-lane phase
  | 'ordered-reduction' // vfredosum: element by element across lanes
  | 'permutation' // slides, gathers, compress: elements cross lanes on the ring
  | 'mask' // mask-register logic and mask-producing scans (vmsbf, viota, ...)
  | 'scalar-result' // vmv.x.s, vfmv.f.s, vcpop.m, vfirst.m: hold the front end
  | 'scalar-insert' // vmv.s.x, vfmv.s.f: write element 0 only
  | 'memory' // loads and stores

/** Operands of one decoded instruction, named as in the RISC-V V 1.0 specification. */
export interface Operands {
  rd?: number // x or f destination (which file is given by the table entry)
  rs1?: number // x or f source 1 (base address for memory ops)
  rs2?: number // x or f source 2 (stride for strided memory ops)
  rs3?: number // f source 3 of fused multiply-add
  /** Rounding mode field (0 rne, 1 rtz, 2 rdn, 3 rup, 4 rmm, 7 dyn). */
  rm?: number
  /** CSR number of the Zicsr instructions. */
  csr?: number
  /** fence predecessor and successor sets (bit 3 i, 2 o, 1 r, 0 w). */
  pred?: number
  succ?: number
  vd?: number // vector destination, or store data (vs3) for vector stores
  vs1?: number
  vs2?: number // also the index vector of indexed memory ops
  imm?: number // sign- or zero-extended immediate, as the instruction uses it
  /** true when the instruction is unmasked (vm = 1). */
  vm?: boolean
  /** vtype immediate of vsetvli/vsetivli. */
  vtypei?: number
}

/** One static instruction of a program, after pseudo-instruction expansion. */
export interface Instruction {
  /** Canonical mnemonic, e.g. 'vfmacc.vf', 'addi', 'vle32.v'. */
  op: string
  operands: Operands
  /** Byte address of the instruction in the text segment. */
  address: number
  /** Canonical text, the form `objdump -d` prints (ABI register names). */
  text: string
  /** Where the user wrote it (absent when decoded from raw words). */
  loc?: SourceLoc
  /** For a label operand (branches, jal, la), the label as written. */
  label?: string
  /**
   * The `c.` mnemonic of a 16-bit RV64C instruction (read from an ELF file or
   * an objdump listing, or written as `c.addi` ...): `op` and `operands` are
   * its 32-bit expansion, which is what runs; absent for 32-bit instructions.
   */
  compressed?: string
}

/** Bytes an instruction takes in the text: 2 for a compressed one, else 4. */
export const instructionSize = (ins: Pick<Instruction, 'compressed'>): 2 | 4 => (ins.compressed ? 2 : 4)

/** An assembled program: text, initial data and symbols. */
export interface Program {
  instructions: Instruction[]
  /** Base address of the text segment. */
  textBase: number
  /** Initial contents of the data segment, little-endian bytes. */
  data: Uint8Array
  /** Base address of the data segment. */
  dataBase: number
  /** Where execution starts: `_start` when the program defines it, else absent (the first instruction). */
  entry?: number
  /** Label name -> byte address (text and data labels) and constant symbols (.equ/.set) -> value. */
  symbols: Record<string, number>
  /** Data labels in source order with their size in bytes, for the data table. */
  dataLabels: { name: string; address: number; size: number; loc: SourceLoc }[]
}
