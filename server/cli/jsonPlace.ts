/**
 * Line and column in JSON text: of a parse error's offset, and of the value
 * at a path (`scenarios.0.versions.1.content.expectations.0.op`), so that a
 * bad bundle is reported where the user can find it. A small scanner over
 * text that JSON.parse already accepted; it never evaluates anything.
 */
export interface Place {
  line: number
  column: number
}

/** 1-based line and column of a character offset. */
export function placeOf(text: string, offset: number): Place {
  const before = text.slice(0, Math.max(0, Math.min(offset, text.length)))
  const lines = before.split('\n')
  return { line: lines.length, column: (lines[lines.length - 1] ?? '').length + 1 }
}

/**
 * Where JSON text stops being JSON (RFC 8259 grammar): the offset of the first
 * character that cannot continue a JSON text, or null when it is JSON. Node
 * 20's JSON.parse messages do not always give a position, so the CLI finds it
 * itself for its "file:line:column" messages.
 */
export function jsonErrorOffset(text: string): number | null {
  let i = 0
  const ws = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i] as string)) i++
  }
  const fail = (): never => {
    throw i
  }
  const value = (): void => {
    ws()
    const c = text[i]
    if (c === '{' || c === '[') {
      const close = c === '{' ? '}' : ']'
      i++
      ws()
      if (text[i] === close) {
        i++
        return
      }
      for (;;) {
        if (c === '{') {
          ws()
          if (text[i] !== '"') fail()
          string()
          ws()
          if (text[i] !== ':') fail()
          i++
        }
        value()
        ws()
        if (text[i] === ',') i++
        else if (text[i] === close) {
          i++
          return
        } else fail()
      }
    }
    if (c === '"') return string()
    const m = /^(-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?|true|false|null)/.exec(text.slice(i, i + 400))
    if (!m) fail()
    i += (m as RegExpExecArray)[0].length
  }
  const string = (): void => {
    i++
    while (i < text.length && text[i] !== '"') {
      if (text.charCodeAt(i) < 0x20) fail()
      if (text[i] === '\\') {
        i++
        if (text[i] === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 1, i + 5))) fail()
          i += 4
        } else if (!'"\\/bfnrt'.includes(text[i] ?? 'x')) fail()
      }
      i++
    }
    if (i >= text.length) fail()
    i++
  }
  try {
    value()
    ws()
    if (i < text.length) fail()
    return null
  } catch (at) {
    if (typeof at === 'number') return at
    throw at
  }
}

/** Where JSON.parse stopped: from the text itself, else from the message ("at position 42"). */
export function parseErrorPlace(text: string, message: string): Place {
  const offset = jsonErrorOffset(text)
  if (offset !== null) return placeOf(text, offset)
  const pos = /position (\d+)/.exec(message)
  return placeOf(text, pos ? Number(pos[1]) : text.length)
}

/** The place of the value at `path` (object keys and array indexes), or of the deepest part of it that exists. */
export function placeOfPath(text: string, path: readonly PropertyKey[]): Place {
  let i = 0
  const ws = () => {
    while (i < text.length && /\s/.test(text[i] as string)) i++
  }
  const skipString = () => {
    i++ // opening quote
    while (i < text.length && text[i] !== '"') i += text[i] === '\\' ? 2 : 1
    i++
  }
  const readString = (): string => {
    const start = i
    skipString()
    return JSON.parse(text.slice(start, i)) as string
  }
  const skipValue = (): void => {
    ws()
    const c = text[i]
    if (c === '"') return skipString()
    if (c === '{' || c === '[') {
      const close = c === '{' ? '}' : ']'
      i++
      ws()
      if (text[i] === close) {
        i++
        return
      }
      for (;;) {
        ws()
        if (c === '{') {
          skipString()
          ws()
          i++ // colon
        }
        skipValue()
        ws()
        if (text[i] === ',') i++
        else {
          i++ // close
          return
        }
      }
    }
    while (i < text.length && !/[\s,\]}]/.test(text[i] as string)) i++
  }
  let found = 0
  ws()
  for (const key of path) {
    ws()
    const c = text[i]
    if (c === '{') {
      i++
      let hit = false
      for (;;) {
        ws()
        if (text[i] === '}') break
        const k = readString()
        ws()
        i++ // colon
        ws()
        if (k === String(key)) {
          hit = true
          break
        }
        skipValue()
        ws()
        if (text[i] === ',') i++
      }
      if (!hit) break
    } else if (c === '[') {
      i++
      let n = 0
      let hit = false
      for (;;) {
        ws()
        if (text[i] === ']') break
        if (n === Number(key)) {
          hit = true
          break
        }
        skipValue()
        ws()
        if (text[i] === ',') i++
        n++
      }
      if (!hit) break
    } else break
    found = i
  }
  return placeOf(text, found)
}
