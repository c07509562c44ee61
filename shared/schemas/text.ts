/**
 * The message of a string field that is missing or of the wrong type, so that
 * `{ "email": 3 }` says "must be text" and `{}` says "is required".
 */
export function textFieldError(label: string) {
  return (issue: { input?: unknown }) => (issue.input === undefined ? `${label} is required` : `${label} must be text`)
}
