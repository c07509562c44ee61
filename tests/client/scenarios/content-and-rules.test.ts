import { describe, expect, it } from 'vitest'
import { scenarioContentSchema } from '@shared/schemas/scenario'
import { walkthroughSchema } from '@shared/schemas/walkthrough'
import { listQueryString } from '@/api/scenarios'
import { bundleFileName, contentFrom, sameContent, stableJson } from '@/lib/scenarios/content'
import { leaveBlocker, memberActions } from '@/lib/workspace/memberRules'
import { DEFAULT_LIST_PARAMS } from '@/stores/scenarios'

describe('scenario content from the Bench', () => {
  const base = scenarioContentSchema.parse({ title: 'saxpy tail', tags: ['tail'], program: 'old' })

  it('takes program, machine, view, expectations and walkthroughs from the Bench and keeps the other fields', () => {
    const expectations = [{ kind: 'metric' as const, metric: 'cycles' as const, op: '<=' as const, value: 120 }]
    const walkthroughs = [walkthroughSchema.parse({ title: 'Tail', steps: [{ cursor: 3, note: 'Lane 3 idles.' }] })]
    const c = contentFrom(base, { program: 'new', machine: base.machine, view: { cursor: 7, window: null, selected: 2 }, expectations, walkthroughs })
    expect(c.expectations).toEqual(expectations)
    expect(c.walkthroughs).toEqual(walkthroughs)
    expect(c.walkthroughs).not.toBe(walkthroughs) // a copy, like the machine
    expect(c.title).toBe('saxpy tail')
    expect(c.tags).toEqual(['tail'])
    expect(c.program).toBe('new')
    expect(c.view).toEqual({ cursor: 7, window: null, selected: 2 })
    expect(c.machine).not.toBe(base.machine) // a copy: later Bench edits do not reach the saved content
  })

  it('compares contents whatever the order of their keys', () => {
    const { view, program, ...rest } = base
    const reordered = JSON.parse(JSON.stringify({ view, program, ...rest }))
    expect(sameContent(base, reordered)).toBe(true)
    expect(sameContent(base, { ...base, view: { ...base.view, cursor: 1 } })).toBe(false)
    expect(stableJson({ b: 1, a: [1, { d: 2, c: 3 }] })).toBe('{"a":[1,{"c":3,"d":2}],"b":1}')
  })

  it.each([
    [['Saxpy: ragged tail (8 lanes)'], 'saxpy-ragged-tail-8-lanes.chimeline.json'],
    [['a', 'b'], 'scenarios-2026-03-01.chimeline.json'],
    [['***'], 'scenario.chimeline.json'],
  ])('names the bundle of %j %s', (titles, name) => {
    expect(bundleFileName(titles, new Date('2026-03-01T10:00:00Z'))).toBe(name)
  })
})

describe('the list query', () => {
  it('sends only the filters that are set', () => {
    expect(listQueryString(DEFAULT_LIST_PARAMS)).toBe('page=1&pageSize=20&sort=updatedAt&order=desc')
  })

  it('joins tags with commas and trims the search text', () => {
    const q = new URLSearchParams(
      listQueryString({ ...DEFAULT_LIST_PARAMS, page: 3, sort: 'title', order: 'asc', tags: ['tail', 'fp64'], author: '6f1c2a3e-4b5d-4e6f-8a9b-0c1d2e3f4a5b', q: '  saxpy ', trash: true }),
    )
    expect(Object.fromEntries(q)).toEqual({
      page: '3', pageSize: '20', sort: 'title', order: 'asc', tag: 'tail,fp64', author: '6f1c2a3e-4b5d-4e6f-8a9b-0c1d2e3f4a5b', q: 'saxpy', trash: 'true',
    })
  })
})

describe('what a member may do to another (the server rules of server/routes/workspaces)', () => {
  const owner = { myId: 'me', myRole: 'owner' as const, ownerCount: 1 }
  it.each([
    ['an owner, to an editor', owner, { userId: 'b', role: 'editor' as const }, { changeRole: true, remove: true, leave: false, makeOwner: true }],
    ['the only owner, to themselves', owner, { userId: 'me', role: 'owner' as const }, { changeRole: false, remove: false, leave: false, makeOwner: false }],
    ['one of two owners, to themselves', { ...owner, ownerCount: 2 }, { userId: 'me', role: 'owner' as const }, { changeRole: true, remove: false, leave: true, makeOwner: false }],
    ['one of two owners, to the other owner', { ...owner, ownerCount: 2 }, { userId: 'b', role: 'owner' as const }, { changeRole: true, remove: true, leave: false, makeOwner: false }],
    ['an editor, to a viewer', { myId: 'me', myRole: 'editor' as const, ownerCount: 1 }, { userId: 'b', role: 'viewer' as const }, { changeRole: false, remove: false, leave: false, makeOwner: false }],
    ['a viewer, to themselves', { myId: 'me', myRole: 'viewer' as const, ownerCount: 1 }, { userId: 'me', role: 'viewer' as const }, { changeRole: false, remove: false, leave: true, makeOwner: false }],
  ])('%s', (_label, viewer, member, actions) => {
    expect(memberActions(viewer, member)).toEqual(actions)
  })

  it('tells the only owner why they cannot leave', () => {
    expect(leaveBlocker(owner)).toMatch(/only owner/)
    expect(leaveBlocker({ ...owner, ownerCount: 2 })).toBeNull()
  })
})
