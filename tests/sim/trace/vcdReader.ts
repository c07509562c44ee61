/**
 * A small value change dump reader for the tests, written from the grammar of
 * IEEE 1364-2005 section 18.2 ("Format of four-state VCD file"), from memory:
 *
 *   value_change_dump_definitions ::= { declaration_command } { simulation_command }
 *   declaration_command ::= $comment [text] $end | $date [text] $end
 *     | $enddefinitions $end | $scope [scope_type scope_identifier] $end
 *     | $timescale [time_number time_unit] $end | $upscope $end
 *     | $var [var_type size identifier_code reference] $end | $version [text] $end
 *   simulation_command ::= $dumpall { value_change } $end | $dumpoff { value_change } $end
 *     | $dumpon { value_change } $end | $dumpvars { value_change } $end
 *     | $comment [text] $end | simulation_time | value_change
 *   simulation_time ::= # decimal_number
 *   value_change ::= scalar_value_change | vector_value_change
 *   scalar_value_change ::= value identifier_code        (no space between them)
 *   value ::= 0 | 1 | x | X | z | Z
 *   vector_value_change ::= b binary_number identifier_code | B ...
 *     | r real_number identifier_code | R ...             (a space before the code)
 *   identifier_code ::= printable ASCII characters, '!' (33) to '~' (126)
 *
 * Tokens are separated by white space. A vector value shorter than its
 * variable is left-extended (section 18.2.3.8 from memory): with 0 when its
 * leftmost bit is 0 or 1, with x when it is x, with z when it is z.
 * The reader is strict: anything outside the grammar throws with the token
 * number, so that a malformed dump fails the test that reads it.
 */

export const SCOPE_TYPES = ['begin', 'fork', 'function', 'module', 'task'] as const
export const VAR_TYPES = [
  'event', 'integer', 'parameter', 'real', 'realtime', 'reg', 'supply0', 'supply1', 'time',
  'tri', 'triand', 'trior', 'trireg', 'tri0', 'tri1', 'wand', 'wire', 'wor',
] as const
const TIME_NUMBERS = ['1', '10', '100']
const TIME_UNITS = ['s', 'ms', 'us', 'ns', 'ps', 'fs']

export interface VcdVar {
  type: (typeof VAR_TYPES)[number]
  size: number
  id: string
  /** The reference as declared, e.g. `read` or `index [15:0]`. */
  reference: string
  /** Scope names from the outermost down, e.g. ['chimeline', 'lane0']. */
  scope: string[]
}

export interface VcdChange {
  time: number
  /** The value as bits, most significant first, left-extended to the variable's size. */
  value: string
}

export interface VcdFile {
  date?: string
  version?: string
  timescale?: { number: number; unit: string }
  comments: string[]
  vars: VcdVar[]
  /** identifier code -> value changes in time order (the $dumpvars values at the first time). */
  changes: Map<string, VcdChange[]>
  /** Every simulation time that appeared, in order. */
  times: number[]
}

const isIdentifierCode = (s: string) => s.length > 0 && [...s].every((c) => c.charCodeAt(0) >= 33 && c.charCodeAt(0) <= 126)

function extend(bits: string, size: number): string {
  if (bits.length > size) throw new Error(`value b${bits} is wider than its ${size}-bit variable`)
  const lead = bits[0] === 'x' || bits[0] === 'z' ? bits[0] : '0'
  return lead.repeat(size - bits.length) + bits
}

export function parseVcd(text: string): VcdFile {
  const tokens = text.split(/\s+/).filter((t) => t.length > 0)
  let pos = 0
  const fail = (what: string): never => {
    throw new Error(`VCD: ${what} at token ${pos} (${JSON.stringify(tokens[pos] ?? '<end>')})`)
  }
  /** Reads the text up to `$end` and returns it (for $comment, $date, $version). */
  const untilEnd = (): string[] => {
    const words: string[] = []
    while (tokens[pos] !== '$end') {
      // A keyword inside a command means its $end is missing.
      if (pos >= tokens.length || tokens[pos]!.startsWith('$')) fail('missing $end')
      words.push(tokens[pos++] as string)
    }
    pos++
    return words
  }
  const file: VcdFile = { comments: [], vars: [], changes: new Map(), times: [] }
  const byId = new Map<string, VcdVar>()
  const scope: string[] = []

  // Declarations.
  let defined = false
  while (!defined) {
    const t = tokens[pos++]
    switch (t) {
      case '$comment': file.comments.push(untilEnd().join(' ')); break
      case '$date': file.date = untilEnd().join(' '); break
      case '$version': file.version = untilEnd().join(' '); break
      case '$timescale': {
        // "1 ns" or "1ns" are both written in practice.
        const words = untilEnd().join('')
        const m = /^(\d+)([a-z]+)$/.exec(words)
        if (!m || !TIME_NUMBERS.includes(m[1] as string) || !TIME_UNITS.includes(m[2] as string)) fail(`bad $timescale "${words}"`)
        file.timescale = { number: Number(m![1]), unit: m![2] as string }
        break
      }
      case '$scope': {
        const [type, name, ...rest] = untilEnd()
        if (!SCOPE_TYPES.includes(type as (typeof SCOPE_TYPES)[number]) || !name || rest.length) fail('bad $scope')
        scope.push(name as string)
        break
      }
      case '$upscope':
        if (untilEnd().length || scope.length === 0) fail('bad $upscope')
        scope.pop()
        break
      case '$var': {
        const [type, size, id, ...ref] = untilEnd()
        if (!VAR_TYPES.includes(type as (typeof VAR_TYPES)[number])) fail(`bad var type ${type}`)
        if (!/^[1-9]\d*$/.test(size ?? '')) fail(`bad var size ${size}`)
        if (!isIdentifierCode(id ?? '')) fail(`bad identifier code ${id}`)
        if (ref.length === 0 || ref.length > 2) fail('bad var reference')
        if (byId.has(id as string)) fail(`identifier code ${id} declared twice`)
        const v: VcdVar = { type: type as VcdVar['type'], size: Number(size), id: id as string, reference: ref.join(' '), scope: [...scope] }
        file.vars.push(v)
        byId.set(v.id, v)
        file.changes.set(v.id, [])
        break
      }
      case '$enddefinitions':
        if (untilEnd().length) fail('bad $enddefinitions')
        if (scope.length) fail('unclosed $scope')
        defined = true
        break
      default:
        fail('expected a declaration command')
    }
  }

  // Simulation commands.
  let time: number | undefined
  const change = (value: string, id: string) => {
    const v = byId.get(id)
    if (!v) fail(`undeclared identifier code ${id}`)
    if (time === undefined) fail('value change before the first simulation time')
    const list = file.changes.get(id) as VcdChange[]
    const last = list[list.length - 1]
    const entry = { time: time as number, value: extend(value, v!.size) }
    if (last && last.time === time) list[list.length - 1] = entry
    else list.push(entry)
  }
  const valueChange = (t: string) => {
    const head = t[0]
    if (head === 'b' || head === 'B') {
      const bits = t.slice(1).toLowerCase()
      if (!/^[01xz]+$/.test(bits)) fail('bad binary number')
      const id = tokens[pos++]
      if (!isIdentifierCode(id ?? '')) fail('missing identifier code')
      change(bits, id as string)
    } else if (head === 'r' || head === 'R') {
      fail('real values are not used by Chimeline dumps')
    } else if (head !== undefined && '01xXzZ'.includes(head)) {
      change(head.toLowerCase(), t.slice(1))
    } else fail('expected a value change')
  }
  while (pos < tokens.length) {
    const t = tokens[pos++] as string
    if (t.startsWith('#')) {
      if (!/^#\d+$/.test(t)) fail('bad simulation time')
      const next = Number(t.slice(1))
      if (time !== undefined && next <= time) fail('simulation time does not increase')
      time = next
      file.times.push(next)
    } else if (t === '$dumpvars' || t === '$dumpall' || t === '$dumpon' || t === '$dumpoff') {
      while (tokens[pos] !== '$end') {
        if (pos >= tokens.length) fail('missing $end')
        valueChange(tokens[pos++] as string)
      }
      pos++
    } else if (t === '$comment') {
      file.comments.push(untilEnd().join(' '))
    } else valueChange(t)
  }
  return file
}

/** The value of a variable at `time` (the last change at or before it), or undefined before its first. */
export function valueAt(file: VcdFile, id: string, time: number): string | undefined {
  const list = file.changes.get(id)
  if (!list) throw new Error(`no variable ${id}`)
  let lo = 0
  let hi = list.length - 1
  let found: string | undefined
  while (lo <= hi) {
    const mid = (lo + hi) >> 1
    const c = list[mid] as VcdChange
    if (c.time <= time) { found = c.value; lo = mid + 1 } else hi = mid - 1
  }
  return found
}

/** Finds a variable by its scope path and reference name, e.g. ('lane0', 'read'). */
export function findVar(file: VcdFile, scopeName: string, reference: string): VcdVar {
  const v = file.vars.find((x) => x.scope[x.scope.length - 1] === scopeName && x.reference.split(' ')[0] === reference)
  if (!v) throw new Error(`no variable ${scopeName}.${reference}`)
  return v
}
