/** Random tokens and their SHA-256 digests (only digests are stored). */
import crypto from 'node:crypto';

/** A URL-safe random token of 32 bytes. */
export function randomToken(): string {
  return crypto.randomBytes(32).toString('base64url');
}

/** Hex SHA-256 of a string. */
export function sha256(value: string): string {
  return crypto.createHash('sha256').update(value).digest('hex');
}
