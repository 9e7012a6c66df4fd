/** argon2id password hashing with configurable cost (lowered only in tests). */
import argon2 from 'argon2';

/** argon2 cost parameters (memory in KiB). */
export interface HashCost {
  memoryCost: number;
  timeCost: number;
  parallelism: number;
}

/** Hash a password with argon2id. */
export function hashPassword(password: string, cost: HashCost): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id, ...cost });
}

/** Check a password against a stored hash; false (never throws) for a malformed hash. */
export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}
