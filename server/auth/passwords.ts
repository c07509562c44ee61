import argon2 from 'argon2'

/**
 * argon2id with the OWASP Password Storage Cheat Sheet's minimum (19 MiB,
 * 2 passes, 1 lane): strong enough, and cheap enough for 2 cores.
 */
const options = { type: argon2.argon2id, memoryCost: 19 * 1024, timeCost: 2, parallelism: 1 } as const

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, options)
}

let dummyHash: Promise<string> | null = null

/**
 * Verifies against the stored hash, or against a dummy one when there is no
 * user, so that an unknown e-mail costs the same time as a wrong password.
 */
export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (hash === null) {
    dummyHash ??= argon2.hash('chimeline-no-such-user', options)
    await argon2.verify(await dummyHash, password)
    return false
  }
  return argon2.verify(hash, password)
}
