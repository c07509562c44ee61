/**
 * The shipped programs in examples/*.s (the Bench menu and the demo seed), each titled by the
 * first line of its header comment.
 *
 * @example
 *   exampleList({ '/examples/saxpy.s': '# saxpy with a ragged tail: ...' })[0] // { id: 'saxpy', title: 'saxpy with a ragged tail', source }
 */

export interface Example {
  id: string
  title: string
  source: string
}

/** Order of the menu: the issue's list first, then anything else alphabetically. */
const ORDER = ['saxpy', 'dot', 'stencil', 'clamp', 'stripmine', 'reduction', 'bank-conflicts']

export function exampleList(files: Record<string, string>): Example[] {
  const list = Object.entries(files).map(([path, source]) => {
    const id = path.replace(/^.*\//, '').replace(/\.s$/, '')
    const first = /^#\s*(.+)$/m.exec(source)?.[1] ?? id
    // The title is the header's first clause: up to the first colon or full stop.
    const title = first.split(/[:.](\s|$)/)[0]?.trim() || id
    return { id, title, source }
  })
  const rank = (id: string) => {
    const i = ORDER.indexOf(id)
    return i < 0 ? ORDER.length : i
  }
  return list.sort((a, b) => rank(a.id) - rank(b.id) || a.id.localeCompare(b.id))
}

/** The label of the examples menu when the program is none of them (edited, or a scenario's own). */
export const CUSTOM_PROGRAM = 'Custom program'

/** The example whose text the program is, to the character, or null: an edited example is a custom program. */
export function exampleOf(source: string, examples: readonly Example[]): Example | null {
  return examples.find((e) => e.source === source) ?? null
}
