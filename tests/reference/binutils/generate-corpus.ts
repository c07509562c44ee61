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

const SAMPLES: Record<Exclude<OperandKind, 'vm' | 'rm' | 'vtypei11' | 'vtypei10'>, [string, string, string]> = {
  xd: ['a0', 't0', 'x31'], xs1: ['a1', 'sp', 't6'], xs2: ['a2', 's0', 'zero'],
  fd: ['fa0', 'ft11', 'f8'], fs1: ['fa1', 'ft0', 'fs11'], fs2: ['fa2', 'f31', 'fs1'], fs3: ['fa3', 'ft1', 'f30'],
  shamt5: ['1', '31', '0'], csr: ['vl', 'fcsr', '0x7c0'], pred: ['rw', 'iorw', 'r'], succ: ['w', 'iorw', 'o'],
  vd: ['v1', 'v24', 'v31'], vs3: ['v1', 'v24', 'v31'], vs2: ['v2', 'v16', 'v30'], vs1: ['v3', 'v8', 'v29'],
  simm5: ['5', '-16', '15'], uimm5: ['0', '31', '7'], avl5: ['0', '31', '8'],
  simm12: ['0', '-2048', '2047'], shamt6: ['1', '63', '0'], uimm20: ['0x12345', '0xfffff', '0'],
  load: ['8(a1)', '-2048(sp)', '2047(t6)'], store: ['8(a1)', '-2048(sp)', '2047(t6)'], vaddr: ['(a1)', '(sp)', '(t6)'],
  branch: ['1b', '1f', '1b'], jump: ['back', 'fwd', 'back'], v0: ['v0', 'v0', 'v0'],
}
const VTYPES = ['e32, m4, ta, ma', 'e8, mf8, tu, mu', 'e64, m1, ta, mu']

function line(op: string, syntax: readonly OperandKind[], k: 0 | 1 | 2): string {
  const parts: string[] = []
  for (const kind of syntax) {
    if (kind === 'vm') {
      if (k === 1) parts.push('v0.t')
    } else if (kind === 'rm') {
      if (k > 0) parts.push(k === 1 ? 'rtz' : 'rne')
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
  'fence', 'sext.w a0, a1', 'zext.b a0, a1', 'negw a0, a1', 'not a0, a1', 'seqz a0, a1', 'snez a0, a1', 'sltz a0, a1', 'sgtz a0, a1',
  'fmv.s fa0, fa1', 'fmv.d fa0, fa1', 'fneg.s fa0, fa1', 'fneg.d fa0, fa1', 'fabs.s fa0, fa1', 'fabs.d fa0, fa1',
  'csrr a0, vlenb', 'csrr a1, vl', 'csrr a2, vtype', 'csrr a3, vxrm', 'csrr a4, vxsat', 'csrw vxrm, a0', 'csrs vcsr, a1', 'csrc vxsat, a2',
  'csrwi vxrm, 2', 'csrsi vxsat, 1', 'csrci vxsat, 1', 'frrm a0', 'fsrm a0', 'fsrm a1, a0', 'frflags a0', 'fsflags a0', 'frcsr a0', 'fscsr a0',
  'fsrmi a0, 2', 'fsflagsi a0, 1', 'rdcycle a0', 'rdinstret a1', 'rdtime a2',
  'vwcvt.x.x.v v2, v4', 'vwcvtu.x.x.v v2, v4, v0.t', 'vncvt.x.x.w v2, v4', 'vl1r.v v1, (a0)', 'vl2r.v v2, (a0)', 'vl4r.v v4, (a0)', 'vl8r.v v8, (a0)',
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
  // Numeric local labels around each group keep conditional branches within reach.
  out.push(`# ${o.op}`, '1:', ...variants, '1:')
}
out.push('# pseudo-instructions', '1:', ...PSEUDO_LINES.map((l) => `  ${l.replace(/, back$|, fwd$/, (m) => (m === ', back' ? ', 1b' : ', 1f'))}`), '1:', 'fwd:', '  ecall', '')

writeFileSync(fileURLToPath(new URL('./corpus.s', import.meta.url)), out.join('\n'))
