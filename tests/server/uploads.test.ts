import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Scenario, Upload } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { IMPORT_MAX_INSTRUCTIONS, UPLOAD_MAX_BYTES, uploadErrorBodySchema, uploadInspectionSchema, uploadResponseSchema } from '../../shared/schemas/upload'
import { scenarioResponseSchema } from '../../shared/schemas/scenario'
import { startTestServer } from './helpers'
import { WHOLE_EXECUTABLE } from '../../server/services/elf/program'
import { readElf } from '../../server/services/elf/reader'
import { assemble } from '../../shared/sim/isa/assembler'
import { defaultMachine, parseMachine } from '../../shared/schemas/machine'
import { findPreset } from '../../shared/sim/presets'
import { SAXPY, buildTeam, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Upload lab')
})
afterAll(async () => {
  await runtime.close()
})

const upload = (name: string, bytes: Buffer | string, fields: Record<string, string> = {}, path = 'uploads') => {
  let req = request(runtime.app).post(`/api/workspaces/${team.workspace.id}/${path}`).set(team.editor.auth)
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v)
  return req.attach('file', Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes), name)
}

/** Nothing of a refused import may remain: same counts of uploads and scenarios. */
async function counts() {
  return { uploads: await Upload.count({ where: { workspaceId: team.workspace.id } }), scenarios: await Scenario.count({ where: { workspaceId: team.workspace.id } }) }
}

async function refused(name: string, bytes: Buffer | string, fields: Record<string, string> = {}) {
  const before = await counts()
  const res = await upload(name, bytes, fields)
  expect(await counts()).toEqual(before)
  return res
}

describe('uploads of good files', () => {
  it('a .s file becomes a scenario; the original bytes and their SHA-256 are kept and linked to it', async () => {
    const res = await upload('saxpy-tail.s', SAXPY)
    expect(res.status).toBe(201)
    const { upload: up, scenarios } = uploadResponseSchema.parse(res.body)
    expect(up).toMatchObject({ fileName: 'saxpy-tail.s', kind: 'asm', size: Buffer.byteLength(SAXPY) })
    const { createHash } = await import('node:crypto')
    expect(up.sha256).toBe(createHash('sha256').update(SAXPY).digest('hex'))
    expect(scenarios.map((s) => s.title)).toEqual(['saxpy-tail'])
    expect(up.scenarioIds).toEqual([scenarios[0]?.id])
    const row = await Upload.findByPk(up.id)
    expect(row?.bytes.toString('utf8')).toBe(SAXPY)
    const s = scenarioResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${scenarios[0]?.id}`).set(team.viewer.auth)).body).scenario
    expect(s.content.program).toBe(SAXPY)
    expect(s.run.status).toBe('ok')
  })

  it("an import runs on the workspace's default preset, or on the preset it names (one default machine everywhere)", async () => {
    const machineOf = async (res: request.Response) => {
      const id = uploadResponseSchema.parse(res.body).scenarios[0]?.id
      return scenarioResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${id}`).set(team.viewer.auth)).body).scenario.content.machine
    }
    // A new workspace's default is the schema's defaults, the same machine the Bench and the CLI start on.
    expect(await machineOf(await upload('default.s', SAXPY))).toEqual(defaultMachine)
    expect(await machineOf(await upload('named.s', SAXPY, { preset: 'textbook-1' }))).toEqual(parseMachine(findPreset('textbook-1')!.machine))
    const bad = await upload('bad-preset.s', SAXPY, { preset: 'no-such-preset' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields.preset).toMatch(/preset is one of/)
    await request(runtime.app).patch(`/api/workspaces/${team.workspace.id}`).set(team.owner.auth).send({ defaultPreset: 'starter-4' }).expect(200)
    try {
      expect(await machineOf(await upload('workspace-default.s', SAXPY))).toEqual(parseMachine(findPreset('starter-4')!.machine))
    } finally {
      await request(runtime.app).patch(`/api/workspaces/${team.workspace.id}`).set(team.owner.auth).send({ defaultPreset: 'default-8' }).expect(200)
    }
  })

  it('an objdump -d listing becomes assembly that assembles back to the same words', async () => {
    const listing = [
      'kernel.o:     file format elf64-littleriscv',
      '',
      'Disassembly of section .text:',
      '',
      '0000000000000000 <loop>:',
      '   0:\t0d3572d7          \tvsetvli\tt0,a0,e32,m8,ta,ma',
      '   4:\t0205e007          \tvle32.v\tv0,(a1)',
      '   8:\t40550533          \tsub\ta0,a0,t0',
      '   c:\tfe051ae3          \tbnez\ta0,0 <loop>',
      '  10:\t00008067          \tret',
    ].join('\n')
    const res = await upload('kernel.txt', listing)
    expect(res.status).toBe(201)
    const id = uploadResponseSchema.parse(res.body).scenarios[0]?.id
    const s = (await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${id}`).set(team.viewer.auth)).body.scenario
    expect(s.content.program).toBe('# Imported from kernel.txt (an objdump -d listing)\n  .text\nL_0:\n  vsetvli t0,a0,e32,m8,ta,ma\n  vle32.v v0,(a1)\n  sub a0,a0,t0\n  bnez a0,L_0\n  ret\n')
  })
})

const kernels = fileURLToPath(new URL('../reference/elf/kernels.s', import.meta.url))
const haveBinutils = (() => {
  try {
    execFileSync('riscv64-linux-gnu-as', ['--version'], { stdio: 'ignore' })
    return true
  } catch {
    if (process.env.CI === 'true') throw new Error('CI: riscv64-linux-gnu-as is missing (bash scripts/ensure-tools.sh riscv)')
    console.warn('\n!!!!! SKIPPING the ELF upload tests: riscv64-linux-gnu-as/ld are missing !!!!!\n')
    return false
  }
})()

describe.skipIf(!haveBinutils)('uploads of RISC-V ELF files built with GNU binutils', () => {
  let dir = ''
  let exe: Buffer
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'chimeline-upload-'))
    execFileSync('riscv64-linux-gnu-as', ['-march=rv64gv', kernels, '-o', join(dir, 'k.o')])
    execFileSync('riscv64-linux-gnu-ld', ['--no-relax', '-e', 'saxpy', join(dir, 'k.o'), '-o', join(dir, 'k')])
    exe = readFileSync(join(dir, 'k'))
  })
  afterAll(() => rmSync(dir, { recursive: true, force: true }))

  it('inspect lists the functions and stores nothing; import of one makes a scenario', async () => {
    const before = await counts()
    const insp = uploadInspectionSchema.parse((await upload('kernels', exe, {}, 'uploads/inspect').expect(200)).body)
    expect(insp.kind).toBe('elf')
    expect(insp.functions?.map((f) => f.name)).toEqual([WHOLE_EXECUTABLE, 'saxpy', 'dot', 'scale_table'])
    expect(await counts()).toEqual(before)
    const res = await upload('kernels', exe, { function: 'dot' })
    expect(res.status).toBe(201)
    const { scenarios } = uploadResponseSchema.parse(res.body)
    expect(scenarios[0]?.title).toBe('dot')
    const s = (await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${scenarios[0]?.id}`).set(team.viewer.auth)).body.scenario
    expect(s.content.program).toContain('vfredusum.vs v8,v2,v8')
    expect(s.content.program).toMatch(/bnez a0,L_[0-9a-f]+/)
  })

  it('an ELF without a chosen function is refused with the list to choose from', async () => {
    const res = await refused('kernels', exe)
    expect(res.status).toBe(400)
    const body = uploadErrorBodySchema.parse(res.body)
    expect(body.error.message).toBe('kernels is an ELF file: choose one of its 4 function(s) to import')
    expect(body.functions?.map((f) => f.name)).toEqual([WHOLE_EXECUTABLE, 'saxpy', 'dot', 'scale_table'])
  })

  it('the whole executable imports with its data at the addresses of the file, entered at its entry point', async () => {
    const res = await upload('kernels', exe, { function: WHOLE_EXECUTABLE })
    expect(res.status).toBe(201)
    const { scenarios } = uploadResponseSchema.parse(res.body)
    const s = (await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${scenarios[0]?.id}`).set(team.viewer.auth)).body.scenario
    const text: string = s.content.program
    expect(text).toMatch(/^ {2}\.origin 0x[0-9a-f]+$/m)
    expect(text).toMatch(/^_start:\nsaxpy:$/m) // -e saxpy: the entry point gets _start
    expect(text).toMatch(/^table:$/m) // the data symbol scale_table reads
    const program = assemble(text)
    expect(program.ok && program.program.entry).toBe(readElf(exe).entry)
  })

  it.each([
    ['a truncated ELF', () => exe.subarray(0, 300), 'truncated', /^k\.elf: the file ends at byte 300, inside the .*: it is truncated$/],
    ['an ELF for another machine', () => { const b = Buffer.from(exe); b.writeUInt16LE(62, 18); return b }, 'elf-machine', /built for x86-64 \(e_machine 62\), not RISC-V/],
    ['a function the linker has not finished', () => readFileSync(join(dir, 'k.o')), 'relocation', /scale_table\+0x0 needs the linker/],
  ])('%s is refused with what and where, and leaves nothing', async (_what, bytes, code, message) => {
    const res = await refused('k.elf', bytes(), { function: 'scale_table' })
    expect(res.status).toBe(400)
    const body = uploadErrorBodySchema.parse(res.body)
    expect(body.error.code).toBe('invalid_file')
    expect(body.error.message).toMatch(message)
    expect(body.diagnostics?.[0]?.code).toBe(code)
    expect(typeof body.diagnostics?.[0]?.offset).toBe('number')
  })
})

describe('uploads of bad files', () => {
  it('a .s with errors returns each error with line and column, and saves nothing', async () => {
    const res = await refused('broken.s', '  .text\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v1, v2\n  vfrob v1, v2, v3\n')
    expect(res.status).toBe(400)
    const body = uploadErrorBodySchema.parse(res.body)
    expect(body.diagnostics?.map((d) => [d.line, d.column])).toEqual([[3, 16], [4, 3]])
    expect(body.error.message).toMatch(/^broken\.s line 3, column 16: vfadd\.vv takes .*\(and 1 more\)$/)
  })

  it('binary garbage is not a text file, and says which byte', async () => {
    const garbage = Buffer.from([0x13, 0x37, 0x00, 0xff, 0xfe, 0x01, 0x02])
    const res = await refused('noise.bin', garbage)
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe('noise.bin is not a text file: byte 0 is 0x13')
    const asAsm = await refused('noise.s', garbage)
    expect(asAsm.body.diagnostics[0]).toEqual({ offset: 0, code: 'binary', message: 'a control byte in a text file' })
  })

  it('a file over the size limit is a 413 with the limit in the message', async () => {
    const res = await refused('huge.s', Buffer.alloc(UPLOAD_MAX_BYTES + 1, 0x20))
    expect(res.status).toBe(413)
    expect(res.body.error).toEqual({ code: 'payload_too_large', message: 'The file is larger than the upload limit of 4 MiB' })
  })

  it('a listing over the instruction limit is refused with the limit', async () => {
    const rows = Array.from({ length: IMPORT_MAX_INSTRUCTIONS + 1 }, (_v, i) => `${(i * 4).toString(16)}:\t00000013\tnop`).join('\n')
    const res = await refused('long.txt', rows)
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe(`long.txt line ${IMPORT_MAX_INSTRUCTIONS + 1}, column 1: more than ${IMPORT_MAX_INSTRUCTIONS} instructions`)
  })

  it('a bundle that is not valid JSON says where', async () => {
    const res = await refused('bad.json', '{\n  "format": "chimeline-scenario-bundle",\n  oops\n}')
    expect(res.status).toBe(400)
    expect(res.body.diagnostics[0]).toMatchObject({ line: 3, code: 'json' })
  })

  it('a bundle of an unknown format version names the field', async () => {
    const res = await refused('future.json', JSON.stringify({ format: 'chimeline-scenario-bundle', formatVersion: 2, exportedAt: new Date().toISOString(), scenarios: [] }))
    expect(res.status).toBe(400)
    expect(res.body.error.fields.formatVersion).toBe('formatVersion 1 is the only one this Chimeline reads')
  })

  it('a bundle whose second scenario is bad imports none of them (one transaction)', async () => {
    const good = { versions: [{ number: 1, message: '', author: 'A', createdAt: new Date().toISOString(), content: { title: 'ok', program: '' }, run: { status: 'failed', stage: 'assemble', code: 'x', message: 'y' } }] }
    const bad = { versions: [{ ...good.versions[0], number: 2 }] }
    const res = await refused('two.json', JSON.stringify({ format: 'chimeline-scenario-bundle', formatVersion: 1, exportedAt: new Date().toISOString(), scenarios: [good, bad] }))
    expect(res.status).toBe(400)
    expect(res.body.error.fields['scenarios.1.versions.0.number']).toBe('Version 1 is numbered 2; versions are numbered 1, 2, 3 ... in order')
  })

  it('a request without a file names the field', async () => {
    const res = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).field('kind', 'asm')
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ file: 'Choose a file to upload (multipart field "file")' })
  })
})
