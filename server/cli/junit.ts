/**
 * JUnit XML for `chimeline check`: one <testsuite> per scenario, one
 * <testcase> per expectation (named by the claim in words), a <failure> with
 * the measured value and the deciding cycle. This is the common form CI
 * servers read (the JUnit/Ant report layout: testsuites > testsuite >
 * testcase > failure; common practice, no formal standard).
 */
import type { ExpectationResult } from '../../shared/schemas/expectation'

export interface CheckedScenario {
  title: string
  version: number
  results: ExpectationResult[]
}

/** XML 1.0 text and attribute escaping; characters XML 1.0 cannot hold at all become U+FFFD. */
export function xmlEscape(s: string): string {
  return s
    .replace(/[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu, '\uFFFD')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
}

function failureText(r: ExpectationResult): string {
  const at = r.at ? `cycle ${r.at.cycle}${r.at.lane === null ? '' : `, lane ${r.at.lane}`}${r.at.instruction === null ? '' : `, instruction ${r.at.instruction}`}` : null
  return [`expected: ${r.text}`, `measured: ${r.measured ?? 'none'}`, r.note, at ? `decided at ${at}` : null].filter((p) => p !== null).join('\n')
}

export function toJunit(scenarios: CheckedScenario[]): string {
  const total = scenarios.reduce((n, s) => n + s.results.length, 0)
  const failures = scenarios.reduce((n, s) => n + s.results.filter((r) => !r.pass).length, 0)
  const out = ['<?xml version="1.0" encoding="UTF-8"?>', `<testsuites name="chimeline check" tests="${total}" failures="${failures}" errors="0">`]
  for (const s of scenarios) {
    const f = s.results.filter((r) => !r.pass).length
    out.push(`  <testsuite name="${xmlEscape(s.title)}" tests="${s.results.length}" failures="${f}" errors="0" skipped="0">`)
    out.push(`    <properties><property name="version" value="${s.version}"/></properties>`)
    for (const r of s.results) {
      const head = `    <testcase classname="${xmlEscape(s.title)}" name="${xmlEscape(r.text)}"`
      if (r.pass) out.push(`${head}/>`)
      else {
        out.push(`${head}>`)
        out.push(`      <failure type="expectation" message="${xmlEscape(`measured ${r.measured ?? 'none'}${r.note ? `: ${r.note}` : ''}`)}">${xmlEscape(failureText(r))}</failure>`)
        out.push('    </testcase>')
      }
    }
    out.push('  </testsuite>')
  }
  out.push('</testsuites>', '')
  return out.join('\n')
}
