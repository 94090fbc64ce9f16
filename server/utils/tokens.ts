import { createHash, randomBytes } from 'node:crypto'

// Tokens go out in links; only their SHA-256 is stored.
export function newToken() {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashToken(token) }
}

export function hashToken(token: string) {
  return createHash('sha256').update(token).digest('hex')
}
