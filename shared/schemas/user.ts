import { z } from 'zod'
import { textFieldError } from './text'

/** Site-wide roles: an admin may read the Outbox and administer the site. */
export const siteRoleSchema = z.enum(['admin', 'member'])
export type SiteRole = z.infer<typeof siteRoleSchema>

/** RFC 5321 caps a forward path at 256 octets, so an address at 254. */
export const EMAIL_MAX_LENGTH = 254

/** An e-mail address as users type it: trimmed and compared in lower case. */
export const emailSchema = z
  .string({ error: textFieldError('An e-mail address') })
  .trim()
  .toLowerCase()
  .max(EMAIL_MAX_LENGTH, `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters`)
  .pipe(z.email({ error: 'Enter a valid e-mail address' }))

export const USER_NAME_MAX_LENGTH = 100

export const userNameSchema = z
  .string({ error: textFieldError('A name') })
  .trim()
  .min(1, 'A name is required')
  .max(USER_NAME_MAX_LENGTH, `A name has at most ${USER_NAME_MAX_LENGTH} characters`)

/** A user as the API shows it. */
export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: siteRoleSchema,
})
export type User = z.infer<typeof userSchema>
