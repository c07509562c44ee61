/**
 * Reads a pasted list of e-mail addresses: one or more a line, separated by
 * commas, semicolons, tabs or spaces, each either bare (`ada@example.org`) or
 * in the form mail programs copy (`Ada Lovelace <ada@example.org>`). Blank
 * lines are skipped. Every address is checked with the one e-mail schema and
 * compared in lower case; a bad one is reported with its line and column, a
 * repeated one with every line it is on. Pure: the client previews with it,
 * the server decides with it.
 *
 * @example
 *   parseAddressList('ada@example.org\nBob <BOB@example.org>, ada@example.org')
 *   // addresses: ada (line 1), bob (line 2); duplicates: ada on lines 1 and 2
 */
import { emailSchema } from '../schemas/user'

export interface AddressListError {
  line: number
  column: number
  text: string
  message: string
}

export interface ParsedAddressList {
  /** Each distinct address once, in order of first appearance, with its first line. */
  addresses: { email: string; line: number }[]
  duplicates: { email: string; lines: number[] }[]
  errors: AddressListError[]
}

/**
 * One entry: `"Name, quoted" <address>`, `Name words <address>` (words
 * without an @, so `ada@x.org Bob <bob@y.org>` stays two entries), `<address>`,
 * a bare run of non-separators, or a stray quote or bracket (reported).
 */
const TOKEN = /"[^"]*"\s*<[^>]*>|[^,;<>\s"@]+(?:[ ]+[^,;<>\s"@]+)*\s*<[^>]*>|<[^>]*>|[^,;<>\s"]+|"[^"]*"?|[<>]/g

function addressOf(token: string): string {
  const angle = /<([^>]*)>\s*$/.exec(token)
  return angle ? (angle[1] ?? '') : token
}

export function parseAddressList(text: string): ParsedAddressList {
  const firstLine = new Map<string, number>()
  const lines = new Map<string, number[]>()
  const errors: AddressListError[] = []
  text.split(/\r\n|\n|\r/).forEach((raw, i) => {
    const line = i + 1
    for (const m of raw.matchAll(TOKEN)) {
      const token = m[0].trim()
      const column = (m.index ?? 0) + 1
      const parsed = emailSchema.safeParse(addressOf(token))
      if (!parsed.success) {
        const why = parsed.error.issues[0]?.message ?? 'Enter a valid e-mail address'
        errors.push({ line, column, text: token, message: `Line ${line}, column ${column}: "${token}" is not an e-mail address (${why})` })
        continue
      }
      const email = parsed.data
      if (!firstLine.has(email)) firstLine.set(email, line)
      lines.set(email, [...(lines.get(email) ?? []), line])
    }
  })
  return {
    addresses: [...firstLine].map(([email, line]) => ({ email, line })),
    duplicates: [...lines].filter(([, ls]) => ls.length > 1).map(([email, ls]) => ({ email, lines: ls })),
    errors,
  }
}
