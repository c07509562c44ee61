/**
 * More of issue 6 in the browser (Debian Chromium against the test server):
 * an ELF import checked against GNU binutils, a bundle round trip, a
 * workspace-only share link for signed-out readers, members and non-members,
 * the 409 conflict between two people saving at once, and the layout at 4K
 * and on a 1280x800 laptop.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { expect, test } from '@playwright/test'
import { DEMO, DEMO_PASSWORD, fillSignIn, signIn, watchConsole } from './helpers/auth'
import { accessToken, workspaceId } from './helpers/api'
import { scenarioApi } from './helpers/scenario-api'
import { appendProgramLine, openScenarioOnBench, programLines, programText } from './helpers/bench-page'
import { binutils, missingBinutils, objdumpFunction, squeeze } from './helpers/binutils'
import { screenshot } from './helpers/screenshots'

const runId = () => `e2e${Date.now().toString(36)}`

// Our own kernels: two functions marked `.type @function` as compilers mark them; 32-bit encodings only.
const KERNELS = `  .option norvc
  .text
  .globl vcount
  .type vcount, @function
vcount:                      # a0 = n, a1 = x: a0 = how many of the first VLMAX int64 are above zero
  vsetvli t0, a0, e64, m1, ta, ma
  vle64.v v8, (a1)
  vmsgt.vi v0, v8, 0
  vcpop.m a0, v0
  ret
  .size vcount, .-vcount

  .globl vscale
  .type vscale, @function
vscale:                      # a0 = n, a1 = x, fa0 = a: x = a*x, strip-mined at LMUL 2
  vsetvli t0, a0, e32, m2, ta, ma
  vle32.v v2, (a1)
  vfmul.vf v2, v2, fa0
  vse32.v v2, (a1)
  slli t1, t0, 2
  add a1, a1, t1
  sub a0, a0, t0
  bnez a0, vscale
  ret
  .size vscale, .-vscale
`

/**
 * The imported program as instructions at addresses: the first one at `start`,
 * one word each, a branch's label replaced by the address its label line stands at.
 */
function importedInstructions(lines: string[], start: number): { address: number; text: string }[] {
  const body = lines.map((l) => l.replace(/#.*$/, '').trim()).filter((l) => l !== '' && !l.startsWith('.'))
  const labels = new Map<string, number>()
  let address = start
  for (const l of body) {
    if (l.endsWith(':')) labels.set(l.slice(0, -1), address)
    else address += 4
  }
  return body
    .filter((l) => !l.endsWith(':'))
    .map((l, i) => {
      const m = /^(\S+)\s+(.*),\s*([A-Za-z_.][\w.]*)$/.exec(l)
      const target = m ? labels.get(m[3] as string) : undefined
      const text = m && target !== undefined ? `${m[1]} ${m[2]},${target.toString(16)}` : l
      return { address: start + 4 * i, text: squeeze(text) }
    })
}

test.describe('imports on the Scenarios page', () => {
  test('a RISC-V ELF executable built by GNU binutils: its functions are listed, and the chosen one imports as objdump -d prints it', async ({ page }) => {
    const missing = missingBinutils()
    if (missing && process.env.CI === 'true') throw new Error(`CI: ${missing}`)
    if (missing) console.warn(`\n!!!!! SKIPPING the browser ELF import check: ${missing} !!!!!\n`)
    test.skip(missing !== null, missing ?? '')

    const run = runId()
    const dir = mkdtempSync(join(tmpdir(), 'chimeline-e2e-elf-'))
    try {
      const exe = join(dir, `${run}-kernels`)
      writeFileSync(join(dir, 'kernels.s'), KERNELS)
      binutils('as', ['-march=rv64gcv', join(dir, 'kernels.s'), '-o', join(dir, 'kernels.o')])
      binutils('ld', ['--no-relax', '-e', 'vscale', join(dir, 'kernels.o'), '-o', exe])
      // The reference: GNU binutils' disassembly of the function the user will choose.
      const reference = objdumpFunction(exe, 'vscale')
      expect(reference.length).toBe(9)

      const problems = watchConsole(page)
      await signIn(page, DEMO.editor)
      await page.goto('/scenarios')
      await page.getByTestId('import-upload').locator('input[type=file]').setInputFiles({ name: `${run}-kernels`, mimeType: 'application/octet-stream', buffer: readFileSync(exe) })

      // The whole executable first, then both functions of the symbol table, with their size.
      const choice = page.getByTestId('import-choice')
      await expect(choice).toContainText('RISC-V ELF file')
      await choice.getByRole('combobox').or(choice.locator('.n-base-selection')).first().click()
      const options = page.locator('.n-base-select-option')
      await expect(options).toHaveCount(3)
      await expect(options.first()).toContainText('(whole executable, from its entry point)')
      await expect(options.filter({ hasText: 'vcount (5 instructions, 20 bytes' })).toHaveCount(1)
      await expect(options.filter({ hasText: `vscale (9 instructions, 36 bytes at 0x${reference[0]!.address.toString(16)})` })).toHaveCount(1)
      await screenshot(page, 'import-elf-functions')
      await options.filter({ hasText: 'vscale' }).click()
      await choice.getByRole('button', { name: 'Import this function' }).click()
      const title = `${run}-kernels: vscale`
      await expect(page.getByText(`Imported ${run}-kernels: “${title}”.`)).toBeVisible()

      // The new scenario opens on the Bench; its program is the function, word for word as objdump -d reads it.
      await page.getByLabel('Search scenarios').fill(run)
      const table = page.getByTestId('scenario-table')
      await expect(table.locator('tbody tr')).toHaveCount(1)
      await table.getByRole('link', { name: title }).click()
      await expect(page.getByTestId('scenario-title')).toHaveText(title)
      await expect(page.getByTestId('program-editor')).toContainText('vfmul.vf')
      const lines = await programLines(page)
      expect(lines[0]).toContain(`Imported from ${run}-kernels: function vscale`)
      expect(importedInstructions(lines, reference[0]!.address)).toEqual(reference)
      await screenshot(page, 'import-elf-bench')
      expect(problems).toEqual([])
    } finally {
      rmSync(dir, { recursive: true, force: true })
    }
  })

  test('a linked rv64gc executable imports whole: compressed instructions keep their c. names, code and data their addresses', async ({ page }) => {
    const missing = missingBinutils()
    if (missing && process.env.CI === 'true') throw new Error(`CI: ${missing}`)
    test.skip(missing !== null, missing ?? '')
    const run = runId()
    const dir = mkdtempSync(join(tmpdir(), 'chimeline-e2e-exe-'))
    try {
      const exe = join(dir, `${run}-hello`)
      // A program of our own: GNU as compresses what it can under rv64gc.
      writeFileSync(join(dir, 'hello.s'), [
        '  .text', '  .globl _start', '_start:', '  la a1, msg', '  li a2, 6', '  li a0, 1', '  li a7, 64', '  ecall', '  li a0, 0', '  li a7, 93', '  ecall',
        '  .data', 'msg:', '  .ascii "chime\\n"', '',
      ].join('\n'))
      binutils('as', ['-march=rv64gc', join(dir, 'hello.s'), '-o', join(dir, 'hello.o')])
      binutils('ld', ['--no-relax', join(dir, 'hello.o'), '-o', exe])

      const problems = watchConsole(page)
      await signIn(page, DEMO.editor)
      await page.goto('/scenarios')
      await page.getByTestId('import-upload').locator('input[type=file]').setInputFiles({ name: `${run}-hello`, mimeType: 'application/octet-stream', buffer: readFileSync(exe) })
      const choice = page.getByTestId('import-choice')
      await expect(choice).toContainText('RISC-V ELF file')
      // The whole executable is the first choice, chosen already.
      await choice.getByRole('button', { name: 'Import this function' }).click()
      const title = `${run}-hello: (whole executable, from its entry point)`
      await expect(page.getByText(`Imported ${run}-hello: “${title}”.`)).toBeVisible()
      await page.getByLabel('Search scenarios').fill(run)
      await page.getByTestId('scenario-table').getByRole('link', { name: title }).click()
      await expect(page.getByTestId('scenario-title')).toHaveText(title)
      const text = (await programLines(page)).join('\n')
      expect(text).toContain('.origin 0x')
      expect(text).toMatch(/c\.li a0,1/)
      expect(text).toContain('msg:')
      await screenshot(page, 'import-elf-whole')
      expect(problems).toEqual([])
    } finally {
      rmSync(dir, { recursive: true, force: true })
    }
  })
})

// Our own demo program (examples/saxpy.s), kept by the tests below as scenario content.
const SAXPY = readFileSync('examples/saxpy.s', 'utf8')

test.describe('bundles', () => {
  test('a bundle exported from the Scenarios page imports again with the same title, program, machine and history', async ({ page, request }) => {
    const run = runId()
    const title = `${run} bundle round trip`
    const token = await accessToken(request, DEMO.owner)
    const api = scenarioApi(request, token, await workspaceId(request, token))
    const id = await api.create({ title, tags: [run], program: SAXPY })
    await api.save(id, 1, { title, tags: [run], program: SAXPY, machine: { lanes: 4, vlen: 2048, issue: 'lockstep' } }, 'four lanes, lockstep')

    const problems = watchConsole(page)
    await signIn(page, DEMO.owner)
    await page.goto('/scenarios')
    const table = page.getByTestId('scenario-table')
    await page.getByLabel('Search scenarios').fill(run)
    await expect(table.locator('tbody tr')).toHaveCount(1)
    await table.locator('tbody tr').first().locator('.n-checkbox').click()
    await expect(page.getByText('1 selected')).toBeVisible()
    const downloading = page.waitForEvent('download')
    await page.getByRole('button', { name: 'Export bundle' }).click()
    const download = await downloading
    expect(download.suggestedFilename()).toBe(`${run}-bundle-round-trip.chimeline.json`)
    const bytes = readFileSync(await download.path())
    const exported = JSON.parse(bytes.toString('utf8'))
    expect(exported.format).toBe('chimeline-scenario-bundle')
    expect(exported.scenarios).toHaveLength(1)
    expect(exported.scenarios[0].versions.map((v: { number: number }) => v.number)).toEqual([1, 2])

    // Import it back through the drop zone, under the name it was saved as: the bundle's titles are shown before anything is stored.
    await page.getByTestId('import-upload').locator('input[type=file]').setInputFiles({ name: download.suggestedFilename(), mimeType: 'application/json', buffer: bytes })
    const choice = page.getByTestId('import-choice')
    await expect(choice).toContainText('scenario bundle')
    await expect(choice.locator('li')).toHaveText([title])
    const importing = page.waitForResponse((r) => r.request().method() === 'POST' && /\/uploads$/.test(new URL(r.url()).pathname))
    await choice.getByRole('button', { name: 'Import 1 scenario', exact: true }).click()
    const imported = ((await (await importing).json()) as { scenarios: { id: string }[] }).scenarios
    expect(imported).toHaveLength(1)
    const copyId = imported[0]!.id
    expect(copyId).not.toBe(id)
    await expect(page.getByText(`Imported ${download.suggestedFilename()}: “${title}”.`)).toBeVisible()
    await expect(table.locator('tbody tr')).toHaveCount(2)
    await screenshot(page, 'bundle-imported')

    // The copy on the Bench: same title, program and machine, and both versions in its history.
    await page.goto(`/bench?scenario=${copyId}`)
    await expect(page.getByTestId('scenario-title')).toHaveText(title)
    await expect(page.getByTestId('lane-chart')).toHaveAttribute('data-lanes', '4', { timeout: 60_000 })
    await expect(page.getByTestId('machine-summary')).toContainText('4 lanes, VLEN 2048, lockstep')
    await expect(page.locator('#machine-lanes')).toHaveValue('4')
    expect(await programText(page)).toBe(SAXPY)
    await page.getByRole('button', { name: 'History' }).click()
    await expect(page.getByTestId('version-list')).toContainText('four lanes, lockstep')
    await expect(page.getByTestId('version-list').locator('.version')).toHaveCount(2)
    await screenshot(page, 'bundle-copy-history')

    // Read back the same: exporting the copy gives the same bundle, apart from when it was made and when
    // its versions were made (an import is dated when it happens; the file's dates are kept only as 'originally').
    type Versioned = { exportedAt: unknown; scenarios: { versions: { createdAt: unknown }[] }[] }
    const undated = (b: Versioned) => ({ ...b, exportedAt: null, scenarios: b.scenarios.map((sc) => ({ ...sc, versions: sc.versions.map((v) => ({ ...v, createdAt: null })) })) })
    expect(undated((await api.exportBundle([copyId])) as Versioned)).toEqual(undated(exported as Versioned))
    expect(problems).toEqual([])
  })
})

test.describe('a share link for workspace members only', () => {
  test('asks a signed-out reader to sign in, opens for a member, and refuses a newly signed-up non-member', async ({ browser, request }) => {
    const run = runId()
    const title = `${run} members only`
    const token = await accessToken(request, DEMO.owner)
    const id = await scenarioApi(request, token, await workspaceId(request, token)).create({ title, program: SAXPY })

    // The owner makes the link in the Share dialog.
    const ownerContext = await browser.newContext()
    const owner = await ownerContext.newPage()
    await signIn(owner, DEMO.owner)
    await owner.goto(`/bench?scenario=${id}`)
    await expect(owner.getByTestId('scenario-title')).toHaveText(title)
    await owner.getByRole('button', { name: 'Share…' }).click()
    const dialog = owner.getByTestId('share-dialog')
    await dialog.getByText('Workspace members only').click()
    await dialog.getByRole('button', { name: 'Create link' }).click()
    const url = await dialog.getByLabel('Share link').inputValue()
    expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{22,}$/)
    await expect(dialog.getByTestId('share-links')).toContainText('workspace members')
    const path = new URL(url).pathname
    await ownerContext.close()

    // A member, signed out: asked to sign in, then lands on the scenario.
    const memberContext = await browser.newContext()
    const member = await memberContext.newPage()
    const memberProblems = watchConsole(member)
    await member.goto(path)
    const problem = member.getByTestId('share-problem')
    await expect(problem).toContainText('Sign in to open this link')
    await expect(problem).toContainText('for members of its workspace only')
    await expect(member.getByTestId('share-title')).toHaveCount(0)
    await screenshot(member, 'share-members-signed-out')
    await problem.getByRole('link', { name: 'Sign in' }).or(problem.getByRole('button', { name: 'Sign in' })).first().click()
    await expect(member).toHaveURL(/\/signin\?redirect=/)
    await fillSignIn(member, DEMO.editor, DEMO_PASSWORD)
    await expect(member).toHaveURL(new RegExp(`${path}$`))
    await expect(member.getByTestId('share-title')).toHaveText(title)
    await expect(member.getByTestId('share-version')).toHaveText('version 1')
    await expect(member.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })
    // The one failure expected in the console is the 401 of the signed-out first visit.
    expect(memberProblems.filter((p) => !p.includes('status of 401'))).toEqual([])
    await memberContext.close()

    // Someone who is no member: signs up from the same prompt, and gets a refusal, not the scenario.
    const strangerContext = await browser.newContext()
    const stranger = await strangerContext.newPage()
    const strangerProblems = watchConsole(stranger)
    await stranger.goto(path)
    await stranger.getByTestId('share-problem').getByRole('link', { name: 'Sign in' }).or(stranger.getByTestId('share-problem').getByRole('button', { name: 'Sign in' })).first().click()
    await stranger.getByRole('link', { name: 'Create an account' }).click()
    await expect(stranger).toHaveURL(/\/signup\?redirect=/)
    await stranger.getByLabel('Name').fill(`Stranger ${run}`)
    await stranger.getByLabel('E-mail').fill(`stranger-${run}@example.org`)
    await stranger.getByLabel('Password', { exact: true }).fill(`long-enough-${run}`)
    await stranger.getByLabel('Password again').fill(`long-enough-${run}`)
    await stranger.getByRole('button', { name: 'Create account' }).click()
    await expect(stranger).toHaveURL(new RegExp(`${path}$`))
    const refusal = stranger.getByTestId('share-problem')
    await expect(refusal).toContainText('No such share link')
    await expect(refusal).toContainText('you are not a member of the workspace it belongs to')
    await expect(stranger.getByTestId('share-title')).toHaveCount(0)
    await expect(stranger.getByTestId('lane-chart')).toHaveCount(0)
    await screenshot(stranger, 'share-members-refused')
    expect(strangerProblems.filter((p) => !p.includes('status of 401') && !p.includes('status of 404'))).toEqual([])
    await strangerContext.close()
  })
})

test.describe('two people saving the same scenario', () => {
  test('the second save gets the conflict dialog; keep mine keeps both versions, reload theirs sets my edit aside to save as a new scenario', async ({ browser, request }) => {
    test.setTimeout(180_000)
    const run = runId()
    const title = `${run} conflict`
    const token = await accessToken(request, DEMO.owner)
    const api = scenarioApi(request, token, await workspaceId(request, token))
    const id = await api.create({ title, program: SAXPY })
    const programOf = (n: number) => api.program(id, n)

    const ownerContext = await browser.newContext()
    const editorContext = await browser.newContext()
    const owner = await ownerContext.newPage()
    const editor = await editorContext.newPage()
    const ownerProblems = watchConsole(owner)
    const editorProblems = watchConsole(editor)
    await signIn(owner, DEMO.owner)
    await signIn(editor, DEMO.editor)
    await openScenarioOnBench(owner, id, title)
    await openScenarioOnBench(editor, id, title)
    const save = (page: typeof owner) => page.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save', exact: true }).click()

    // Round 1: both edit version 1; the owner saves first.
    await appendProgramLine(owner, '# owner: round one')
    await appendProgramLine(editor, '# editor: round one')
    await expect(owner.getByTestId('unsaved')).toBeVisible()
    await save(owner)
    await expect(owner.getByText('Saved version 2.')).toBeVisible()
    await save(editor)
    const conflict = editor.getByTestId('conflict-dialog')
    await expect(conflict).toBeVisible()
    await expect(conflict).toContainText('You started from version 1; Olive Owner saved version 2')
    await screenshot(editor, 'conflict-dialog')
    await conflict.getByRole('button', { name: 'Keep mine as a new version' }).click()
    await expect(editor.getByText('Kept your edit as version 3.')).toBeVisible()
    await expect(conflict).toBeHidden()

    // The history lists both edits as versions of their own, each with its program text.
    await editor.getByRole('button', { name: 'History' }).click()
    const list = editor.getByTestId('version-list')
    await expect(list.locator('.version')).toHaveCount(3)
    await expect(list).toContainText('Kept my edit over version 2')
    const diff = editor.getByTestId('version-diff')
    await expect(diff).toContainText('# editor: round one') // v3 against v2: my line in, theirs out
    await expect(diff).toContainText('# owner: round one')
    await list.locator('.version').filter({ hasText: 'v2' }).getByRole('button', { name: 'Changes' }).click()
    await expect(editor.getByText('Changes from v1 to v2')).toBeVisible()
    await expect(diff).toContainText('# owner: round one')
    await expect(diff).not.toContainText('# editor: round one')
    await screenshot(editor, 'conflict-history')
    await editor.keyboard.press('Escape')
    expect(await programOf(2)).toBe(`${SAXPY}\n# owner: round one`)
    expect(await programOf(3)).toBe(`${SAXPY}\n# editor: round one`)

    // Round 2: the owner reloads (now at version 3); both edit; the owner saves first again.
    await openScenarioOnBench(owner, id, title)
    await expect(owner.getByTestId('program-editor')).toContainText('# editor: round one')
    await appendProgramLine(owner, '# owner: round two')
    await appendProgramLine(editor, '# editor: round two')
    await save(owner)
    await expect(owner.getByText('Saved version 4.')).toBeVisible()
    await save(editor)
    await expect(conflict).toContainText('You started from version 3; Olive Owner saved version 4')
    await conflict.getByRole('button', { name: 'Reload theirs' }).click()
    await expect(conflict).toBeHidden()
    await expect(editor.getByTestId('program-editor')).toContainText('# owner: round two')
    expect(await programText(editor)).not.toContain('# editor: round two')
    await expect(editor.getByTestId('scenario-toolbar')).toContainText('v4')
    const aside = editor.getByTestId('scenario-toolbar').getByRole('status')
    await expect(aside).toContainText('Your edit from before reloading is set aside.')
    await screenshot(editor, 'conflict-reloaded-theirs')

    // As promised, the edit is recoverable: put back on the Bench and saved as a scenario of its own.
    await aside.getByRole('button', { name: 'Put it on the Bench and save it as a new scenario' }).click()
    await editor.getByLabel('Title').fill(`${run} my round two`)
    await editor.getByRole('button', { name: 'Save', exact: true }).last().click()
    await expect(editor.getByTestId('scenario-title')).toHaveText(`${run} my round two`)
    // The export ends the file with a newline; the stored program is the edit itself.
    expect(await programText(editor)).toBe(`${SAXPY}\n# editor: round one\n# editor: round two\n`)
    await expect(editor).toHaveURL(/scenario=/)
    const variant = new URL(editor.url()).searchParams.get('scenario')
    expect(variant).not.toBe(id)
    expect(await api.program(variant!)).toBe(`${SAXPY}\n# editor: round one\n# editor: round two`)
    expect(await programOf(4)).toBe(`${SAXPY}\n# editor: round one\n# owner: round two`)

    // The one failure expected in the console is the editor's two 409 answers.
    expect(ownerProblems).toEqual([])
    expect(editorProblems.filter((p) => !p.includes('status of 409'))).toEqual([])
    await ownerContext.close()
    await editorContext.close()
  })
})

test.describe('layout from a 1280x800 laptop to 4K', () => {
  for (const size of [{ width: 3840, height: 2160 }, { width: 1280, height: 800 }]) {
    test(`the Bench with a run and the Scenarios page at ${size.width}x${size.height}`, async ({ page }) => {
      const name = `${size.width}x${size.height}`
      await page.setViewportSize(size)
      await signIn(page, DEMO.editor)
      await page.goto('/bench')
      const chart = page.getByTestId('lane-chart')
      await expect(chart).toBeVisible({ timeout: 60_000 })
      await expect(page.getByTestId('metric-cycles')).toBeVisible()
      await page.getByTestId('cursor-cycle').click()
      for (let i = 0; i < 8; i++) await page.keyboard.press('Shift+ArrowRight')
      await page.waitForTimeout(300)
      await screenshot(page, `layout-bench-${name}`)
      // Common practice: a page that fits needs no sideways scrolling, and the chart takes a fair part of the width.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(size.width)
      const box = await page.getByTestId('chart-box').boundingBox()
      expect(box!.width).toBeGreaterThan(size.width * 0.45)
      // The editor and the lanes grow with the height (48 % of it for the editor, 320 to 1100 px; the lanes
      // about 42 %, tracks up to 28 px), so a tall screen is not left a quarter empty and a laptop keeps both usable.
      const editor = (await page.locator('.editor-box').boundingBox())!
      expect(editor.height).toBeGreaterThanOrEqual(Math.min(1100, Math.max(320, size.height * 0.48)) - 2)
      const lanes = (await chart.locator('.lc-bars').boundingBox())!
      expect(lanes.height).toBeGreaterThan(size.height >= 2000 ? 440 : 200)
      const bottom = await page.evaluate(() => Math.max(...[...document.querySelectorAll('.bench .columns > *')].map((c) => c.getBoundingClientRect().bottom + window.scrollY)))
      expect(bottom).toBeGreaterThan(size.height * 0.85)

      await page.goto('/scenarios')
      await expect(page.getByTestId('scenario-table').locator('tbody tr').first()).toBeVisible()
      await screenshot(page, `layout-scenarios-${name}`)
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(size.width)
      // A row is read across: on a wide screen the table stops at 2000 px, centred, so a title stays near its Open button.
      const table = (await page.getByTestId('scenario-table').boundingBox())!
      expect(table.width).toBeLessThanOrEqual(2000)
      expect(Math.abs(table.x - (size.width - table.x - table.width))).toBeLessThan(40)
    })
  }
})
