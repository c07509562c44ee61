/**
 * GNU binutils for RISC-V (Debian package binutils-riscv64-linux-gnu) as the
 * reference of the browser's ELF import: the test assembles and links its own
 * kernels with riscv64-linux-gnu-as and -ld, and compares what the page shows
 * with what riscv64-linux-gnu-objdump -d prints.
 */
import { execFileSync } from 'node:child_process'

const TOOLS = ['as', 'ld', 'objdump'] as const

export const binutils = (tool: (typeof TOOLS)[number], args: string[]) => execFileSync(`riscv64-linux-gnu-${tool}`, args, { encoding: 'utf8' })

/** Null when all three tools answer, otherwise what is missing and how to install it. */
export function missingBinutils(): string | null {
  try {
    for (const tool of TOOLS) binutils(tool, ['--version'])
    return null
  } catch {
    return 'GNU binutils for RISC-V (riscv64-linux-gnu-as/ld/objdump) is missing: install with `bash scripts/ensure-tools.sh riscv`'
  }
}

export interface ObjdumpRow {
  address: number
  /** The instruction text with spaces squeezed out after commas, and a branch target as its bare hex address. */
  text: string
}

/**
 * One function's rows of `objdump -d --disassemble=NAME`: "  100b0:\t0005a287 \tvle32.v\tv2,(a1)".
 * The `<symbol+off>` note after a branch target is dropped, leaving the address objdump computed.
 */
export function objdumpFunction(file: string, name: string): ObjdumpRow[] {
  const rows: ObjdumpRow[] = []
  for (const line of binutils('objdump', ['-d', `--disassemble=${name}`, file]).split('\n')) {
    const m = /^\s*([0-9a-f]+):\s+[0-9a-f]{8}\s+(.*)$/.exec(line)
    if (m) rows.push({ address: parseInt(m[1] as string, 16), text: isaName(squeeze((m[2] as string).replace(/#.*$/, '').replace(/\s*<[^>]*>/, ''))) })
  }
  return rows
}

/**
 * binutils 2.40 (Debian 12) prints the immediate forms of add/and/or/sll/srl/sra
 * under the register form's name ("sll t1,t0,0x2" for slli); the ISA names them
 * with an i, as tests/reference/binutils does too.
 */
function isaName(text: string): string {
  return text.replace(/^(add|and|or|sll|srl|sra) ([a-z0-9]+),([a-z0-9]+),(-?(0x[0-9a-f]+|[0-9]+))$/, (_m, op: string, rd: string, rs: string, imm: string) => `${op}i ${rd},${rs},${imm}`)
}

/** Mnemonic, one space, operands without spaces: how both sides are compared. */
export function squeeze(text: string): string {
  const t = text.trim().replace(/\s+/g, ' ')
  const space = t.indexOf(' ')
  return space < 0 ? t : `${t.slice(0, space)} ${t.slice(space + 1).replace(/\s+/g, '')}`
}
