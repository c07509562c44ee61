import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { C_FORMS } from '../../../shared/sim/isa/compressed'
import { PSEUDOS } from '../../../shared/sim/isa/pseudo'
import { OPS } from '../../../shared/sim/isa/table'

const readme = readFileSync(fileURLToPath(new URL('../../../README.md', import.meta.url)), 'utf8')
const block = /<!-- isa:supported:start[^>]*-->([\s\S]*?)<!-- isa:supported:end -->/.exec(readme)?.[1] ?? ''
/** category -> mnemonics, from lines "- **category**: `a` `b`". */
const listed = new Map([...block.matchAll(/^- \*\*(.+?)\*\*: (.*)$/gm)].map((m) => [m[1], [...(m[2] ?? '').matchAll(/`([^`]+)`/g)].map((x) => x[1])]))

describe('README "Supported instructions" list', () => {
  it('lists every category of the instruction table with exactly its mnemonics, in table order', () => {
    const cats = [...new Set(OPS.map((o) => o.category))]
    for (const c of cats) expect([c, listed.get(c)]).toEqual([c, OPS.filter((o) => o.category === c).map((o) => o.op)])
  })

  it('lists exactly the pseudo-instructions the assembler expands', () => {
    expect(listed.get('pseudo-instructions')).toEqual(Object.keys(PSEUDOS))
  })

  it('lists exactly the compressed forms the decoder and assembler know', () => {
    expect(listed.get('compressed (RV64C)')).toEqual(C_FORMS.map((f) => f.name))
  })

  it('has no other categories', () => {
    expect([...listed.keys()].sort()).toEqual([...new Set(OPS.map((o) => o.category)), 'compressed (RV64C)', 'pseudo-instructions'].sort())
  })
})
