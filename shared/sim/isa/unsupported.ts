/**
 * Valid RISC-V V 1.0 mnemonics that Chimeline does not support yet (widening,
 * narrowing, fixed-point, carry, segment, fault-only-first and whole-register
 * forms, and a few unary ops). The assembler rejects them with "not supported
 * yet" instead of calling them unknown, so users know the gap is ours, not theirs.
 * Names from the specification's instruction listing (sections 7, 11 to 16).
 */
const EEWS = [8, 16, 32, 64]
const NF = [2, 3, 4, 5, 6, 7, 8]

const names: string[] = []
const forms = (bases: string[], suffixes: string[]): void => {
  for (const b of bases) for (const s of suffixes) names.push(`${b}.${s}`)
}

for (const e of EEWS) {
  names.push(`vle${e}ff.v`)
  for (const n of [1, 2, 4, 8]) names.push(`vl${n}re${e}.v`)
  for (const n of NF) {
    names.push(`vlseg${n}e${e}.v`, `vlseg${n}e${e}ff.v`, `vsseg${n}e${e}.v`, `vlsseg${n}e${e}.v`, `vssseg${n}e${e}.v`)
    for (const k of ['u', 'o']) names.push(`vl${k}xseg${n}ei${e}.v`, `vs${k}xseg${n}ei${e}.v`)
  }
}
for (const n of [1, 2, 4, 8]) names.push(`vs${n}r.v`, `vl${n}r.v`, `vmv${n}r.v`)
forms(['vadc', 'vsbc'], ['vvm', 'vxm'])
forms(['vadc'], ['vim'])
forms(['vmadc'], ['vvm', 'vxm', 'vim', 'vv', 'vx', 'vi'])
forms(['vmsbc'], ['vvm', 'vxm', 'vv', 'vx'])
forms(['vzext', 'vsext'], ['vf2', 'vf4', 'vf8'])
forms(['vmulhsu', 'vwmul', 'vwmulu', 'vwmulsu', 'vwmaccu', 'vwmacc', 'vwmaccsu', 'vaaddu', 'vaadd', 'vasubu', 'vasub', 'vsmul', 'vssubu', 'vssub'], ['vv', 'vx'])
forms(['vwmaccus'], ['vx'])
forms(['vwaddu', 'vwadd', 'vwsubu', 'vwsub'], ['vv', 'vx', 'wv', 'wx'])
forms(['vnsrl', 'vnsra', 'vnclipu', 'vnclip'], ['wv', 'wx', 'wi'])
forms(['vsaddu', 'vsadd', 'vssrl', 'vssra'], ['vv', 'vx', 'vi'])
forms(['vwredsumu', 'vwredsum', 'vfwredusum', 'vfwredosum'], ['vs'])
names.push('vrgatherei16.vv', 'vwcvt.x.x.v', 'vwcvtu.x.x.v', 'vncvt.x.x.w')
names.push('vfrsqrt7.v', 'vfrec7.v', 'vfclass.v', 'vfcvt.rtz.xu.f.v')
forms(['vfwadd', 'vfwsub'], ['vv', 'vf', 'wv', 'wf'])
forms(['vfwmul', 'vfwmacc', 'vfwnmacc', 'vfwmsac', 'vfwnmsac'], ['vv', 'vf'])
for (const c of ['xu.f', 'x.f', 'f.xu', 'f.x', 'f.f', 'rtz.xu.f', 'rtz.x.f']) names.push(`vfwcvt.${c}.v`, `vfncvt.${c}.w`)
names.push('vfncvt.rod.f.f.w')

const unsupported = new Set(names)

/** true when `mnemonic` is valid RISC-V V 1.0 but not in Chimeline's table yet. */
export function isUnsupportedVector(mnemonic: string): boolean {
  return unsupported.has(mnemonic)
}
