import { describe, expect, it } from 'vitest'
import { placeOf, uploadProblems } from '@/lib/scenarios/diagnostics'

describe('the problems of a refused import', () => {
  it('lists every diagnostic with its line and column', () => {
    const p = uploadProblems({
      error: { code: 'invalid_file', message: 'kernel.s does not assemble' },
      diagnostics: [
        { line: 3, column: 9, code: 'unknown_register', message: 'unknown register v33' },
        { line: 7, code: 'unknown_mnemonic', message: 'unknown instruction vfoo.vv' },
      ],
    })
    expect(p).toEqual({
      message: 'kernel.s does not assemble',
      places: ['line 3, column 9: unknown register v33', 'line 7: unknown instruction vfoo.vv'],
      functions: [],
    })
  })

  it('places a binary problem at its byte offset, in decimal and hex', () => {
    expect(placeOf({ offset: 64, code: 'truncated', message: 'section table cut short' })).toBe('byte 64 (0x40)')
  })

  it('keeps the functions of an ELF sent without a choice, so the page can offer them', () => {
    const p = uploadProblems({
      error: { code: 'validation_failed', message: 'Choose a function', fields: { function: 'Name one of the functions' } },
      functions: [{ name: 'saxpy', address: 0, size: 40, instructions: 10 }],
    })
    expect(p?.functions.map((f) => f.name)).toEqual(['saxpy'])
    expect(p?.places).toEqual(['function: Name one of the functions'])
  })

  it('answers null for a body that is not an upload error, so the plain message is shown', () => {
    expect(uploadProblems('<html>Bad gateway</html>')).toBeNull()
    expect(uploadProblems(undefined)).toBeNull()
  })
})
