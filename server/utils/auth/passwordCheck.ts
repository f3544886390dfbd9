import { randomBytes } from 'node:crypto'

// A hash of a random password nobody knows, made once per process with the same scrypt
// settings as every account's hash.
let dummy: Promise<string> | undefined

/**
 * Whether `password` matches the account's hash. Without an account the password is checked
 * against a dummy hash, so that an unknown address costs one scrypt check like a known one
 * (the time of the answer does not tell whether the address has an account).
 */
export async function passwordMatches(hash: string | undefined, password: string): Promise<boolean> {
  dummy ??= hashPassword(randomBytes(24).toString('base64url'))
  const matches = await verifyPassword(hash ?? (await dummy), password)
  return hash !== undefined && matches
}
