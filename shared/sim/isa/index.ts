/** The front end's public interface: assemble, encode, decode, read objdump text. */
export { assemble, ASSEMBLE_DEFAULTS, type AssembleOptions, type AssembleResult } from './assembler'
export { encode } from './encoder'
export { OPS, opInfo, type OpInfo, type OpCategory, type VGroup } from './table'
export { decodeVtype, encodeVtype, formatVtype, vlmax, type Vtype } from './vtype'
export { formatInstruction } from './format'
export type * from './types'
export { decodeWord, type DecodeError, type DecodeResult } from './decoder'
export { parseObjdump, parseHexWords, type ObjdumpRow, type ReadOptions, type ReadResult } from './objdump'
