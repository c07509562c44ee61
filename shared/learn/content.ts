/**
 * A lesson as scenario content: what the Learn page puts on the Bench to play
 * it (and what a copy of it saves). Its expectations are every step's checks,
 * so the Bench's Expectations panel shows the lesson's claims holding; its
 * walkthrough is the lesson's (kept when the user saves a copy); the view is
 * the first step's.
 */
import { scenarioContentSchema, type ScenarioContent } from '../schemas/scenario'
import type { Expectation } from '../schemas/expectation'
import type { Lesson } from './lesson'

export function lessonContent(lesson: Lesson): ScenarioContent {
  const first = lesson.walkthrough.steps[0]
  const seen = new Set<string>()
  const expectations: Expectation[] = []
  for (const c of lesson.walkthrough.steps.flatMap((s) => s.checks)) {
    const key = JSON.stringify(c)
    if (!seen.has(key)) expectations.push(c)
    seen.add(key)
  }
  return scenarioContentSchema.parse({
    title: `Lesson: ${lesson.title}`,
    description: lesson.teaches,
    tags: ['lesson'],
    program: lesson.program,
    machine: lesson.machine,
    view: first
      ? {
          cursor: first.cursor,
          window: first.window,
          selected: first.highlight.instruction ?? null,
          ...(first.subRows === undefined ? {} : { subRows: first.subRows }),
          ...(first.dependencies === undefined ? {} : { dependencies: first.dependencies }),
          register: first.highlight.register ?? null,
        }
      : {},
    expectations,
    walkthroughs: [lesson.walkthrough],
  })
}
