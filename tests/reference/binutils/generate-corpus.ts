/**
 * Writes corpus.s: every mnemonic of Chimeline's instruction table in three
 * operand variants (edge immediates, masked and unmasked, ABI and numbered
 * registers), then the pseudo-instructions. Run after changing the table:
 *   npx tsx tests/reference/binutils/generate-corpus.ts
 * Config instructions come last so that no vtype is known statically for the
 * vector lines (their register choices need not fit one LMUL).
 */
import { writeFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import type { OperandKind } from '../../../shared/sim/isa/fields'
import { OPS } from '../../../shared/sim/isa/table'

const SAMPLES: Record<Exclude<OperandKind, 'vm' | 'vtypei11' | 'vtypei10'>, [string, string, string]> = {
  xd: ['a0', 't0', 'x31'], xs1: ['a1', 'sp', 't6'], xs2: ['a2', 's0', 'zero'],
  fd: ['fa0', 'ft11', 'f8'], fs1: ['fa1', 'ft0', 'fs11'], fs2: ['fa2', 'f31', 'fs1'],
  vd: ['v1', 'v24', 'v31'], vs3: ['v1', 'v24', 'v31'], vs2: ['v2', 'v16', 'v30'], vs1: ['v3', 'v8', 'v29'],
  simm5: ['5', '-16', '15'], uimm5: ['0', '31', '7'], avl5: ['0', '31', '8'],
  simm12: ['0', '-2048', '2047'], shamt6: ['1', '63', '0'], uimm20: ['0x12345', '0xfffff', '0'],
  load: ['8(a1)', '-2048(sp)', '2047(t6)'], store: ['8(a1)', '-2048(sp)', '2047(t6)'], vaddr: ['(a1)', '(sp)', '(t6)'],
  branch: ['back', 'fwd', 'back'], jump: ['back', 'fwd', 'back'], v0: ['v0', 'v0', 'v0'],
}
const VTYPES = ['e32, m4, ta, ma', 'e8, mf8, tu, mu', 'e64, m1, ta, mu']

function line(op: string, syntax: readonly OperandKind[], k: 0 | 1 | 2): string {
  const parts: string[] = []
  for (const kind of syntax) {
    if (kind === 'vm') {
      if (k === 1) parts.push('v0.t')
    } else if (kind === 'vtypei11' || kind === 'vtypei10') parts.push(VTYPES[k] as string)
    else parts.push(SAMPLES[kind][k])
  }
  return `  ${op}${parts.length ? ' ' + parts.join(', ') : ''}`
}

const PSEUDO_LINES = [
  // li of a value needing lui + addi is left out: GNU as uses addiw there, Chimeline addi (same value).
  'nop', 'mv a0, a1', 'li a0, 0', 'li a1, -2048', 'li a2, 2047', 'li t1, -4096', 'neg a0, a1',
  'j back', 'jal fwd', 'jr t0', 'jalr a0', 'ret', 'beqz a0, back', 'bnez a1, fwd', 'bgez a2, back', 'bltz a3, back',
  'blez a4, back', 'bgtz a5, back', 'bgt a0, a1, back', 'ble a0, a1, back', 'bgtu a0, a1, back', 'bleu a0, a1, back',
  'vneg.v v1, v2', 'vneg.v v1, v2, v0.t', 'vnot.v v1, v2', 'vnot.v v1, v2, v0.t', 'vfneg.v v1, v2', 'vfabs.v v1, v2, v0.t',
  'vmnot.m v1, v2', 'vmmv.m v1, v2', 'vmclr.m v3', 'vmset.m v4',
  'vmsgt.vv v1, v2, v3', 'vmsgtu.vv v1, v2, v3, v0.t', 'vmsge.vv v1, v2, v3', 'vmsgeu.vv v1, v2, v3',
  'vmfgt.vv v1, v2, v3', 'vmfge.vv v1, v2, v3, v0.t',
  'vmslt.vi v1, v2, -15', 'vmslt.vi v1, v2, 16', 'vmsltu.vi v1, v2, 5', 'vmsltu.vi v1, v2, 0',
  'vmsge.vi v1, v2, 5', 'vmsgeu.vi v1, v2, 5', 'vmsgeu.vi v1, v2, 0',
  'vmsge.vx v1, v2, a0', 'vmsgeu.vx v1, v2, a0', 'vmsge.vx v1, v2, a0, v0.t',
  'vfsgnj.vv v1, v2, v2', 'vmand.mm v5, v5, v5', 'vmxor.mm v1, v2, v2',
]

const out: string[] = [
  '# Chimeline reference corpus for GNU binutils (riscv64-linux-gnu-as -march=rv64gcv).',
  '# Our own: generated from the instruction table by generate-corpus.ts; no words copied from elsewhere.',
  '.option norvc',
  '.text',
  'back:',
]
const vectorFirst = [...OPS.filter((o) => !o.config), ...OPS.filter((o) => o.config)]
for (const o of vectorFirst) {
  const variants = new Set([0, 1, 2].map((k) => line(o.op, o.syntax, k as 0 | 1 | 2)))
  out.push(`# ${o.op}`, ...variants)
}
out.push('# pseudo-instructions', ...PSEUDO_LINES.map((l) => `  ${l}`), 'fwd:', '  ecall', '')

writeFileSync(fileURLToPath(new URL('./corpus.s', import.meta.url)), out.join('\n'))
