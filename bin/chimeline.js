#!/usr/bin/env node
// The `chimeline` command (package.json "bin"): runs the TypeScript command
// lines of server/cli through tsx, a dependency, so a team needs no build step.
import { register } from 'tsx/esm/api'

const COMMANDS = { check: '../server/cli/check.ts', report: '../server/cli/report.ts' }
const [command, ...args] = process.argv.slice(2)
const module = COMMANDS[command ?? '']
if (!module) {
  process.stderr.write(`chimeline: ${command ? `unknown command "${command}"` : 'no command given'}; commands: ${Object.keys(COMMANDS).join(', ')}\n`)
  process.stderr.write('usage: chimeline check BUNDLE.json [--junit FILE.xml] [--preset NAME] [--set PATH=VALUE]...\n       chimeline report BUNDLE.json [--preset NAME]... [--format md|csv] [--out FILE]\n')
  process.exit(2)
}
register()
const { main } = await import(new URL(module, import.meta.url).href)
process.exitCode = main(args)
