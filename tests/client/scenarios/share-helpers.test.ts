import { describe, expect, it } from 'vitest'
import { ApiError } from '@/api'
import { expiryFor, splitRecipients } from '@/lib/scenarios/shareExpiry'
import { shareProblem } from '@/lib/scenarios/shareProblem'
import { viewText } from '@/lib/scenarios/viewText'

describe('share link helpers', () => {
  it.each([
    ['1d', '2026-03-02T10:00:00.000Z'],
    ['7d', '2026-03-08T10:00:00.000Z'],
    ['30d', '2026-03-31T10:00:00.000Z'],
    ['365d', '2027-03-01T10:00:00.000Z'],
    ['never', null],
  ] as const)('turns the lifetime %s into the absolute expiry %s (ISO 8601, UTC)', (choice, iso) => {
    expect(expiryFor(choice, new Date('2026-03-01T10:00:00Z'))).toBe(iso)
  })

  it('splits recipients on commas, semicolons, spaces and new lines, lower-cased, without duplicates', () => {
    expect(splitRecipients('Ana@Example.org, bo@example.org;\ncy@example.org  ana@example.org,,')).toEqual([
      'ana@example.org',
      'bo@example.org',
      'cy@example.org',
    ])
    expect(splitRecipients('  ')).toEqual([])
  })

  it.each([
    [{ cursor: 42, window: { start: 0, end: 120 }, selected: 3 }, 'cycle 42, cycles 0–119, instruction #3'],
    // A 23-cycle run runs cycles 0 to 22 (issue 10: it said 0–23).
    [{ cursor: 11, window: { start: 0, end: 23 }, selected: null }, 'cycle 11, cycles 0–22'],
    [{ cursor: 35494, window: null, selected: null }, 'cycle 35,494'],
    [{ cursor: 0, window: null, selected: null }, 'cycle 0'],
    [{ cursor: 5, window: null, selected: 2, subRows: true, dependencies: true, register: 8 }, 'cycle 5, instruction #2, R/E/W rows, dependency arrows, register v8'],
    [{ cursor: null, window: null, selected: null }, 'the whole run'],
  ])('describes the view %j as "%s"', (view, text) => {
    expect(viewText(view)).toBe(text)
  })

  it.each([
    [new ApiError(410, 'share_revoked', 'revoked'), 'This share link was revoked', false],
    [new ApiError(410, 'share_expired', 'This share link expired on 2026-01-01T00:00:00.000Z'), 'This share link has expired', false],
    [new ApiError(404, 'not_found', 'share link not found'), 'No such share link', false],
    [new ApiError(401, 'unauthenticated', 'sign in'), 'Sign in to open this link', true],
    [new ApiError(0, 'network', 'Could not reach the Chimeline server.'), 'Chimeline cannot be reached', false],
  ])('gives a page of its own to %s', (err, title, signIn) => {
    const p = shareProblem(err)
    expect(p.title).toBe(title)
    expect(p.signIn).toBe(signIn)
  })
})
