import { hash, verify } from '@node-rs/argon2';

/**
 * argon2id (the package's default algorithm) with OWASP's baseline cost: 19 MiB, 2 passes, 1 lane.
 * Hashes are PHC strings (`$argon2id$v=19$m=19456,t=2,p=1$…`), so the cost can rise later without a migration.
 */
const COST = { memoryCost: 19456, timeCost: 2, parallelism: 1 };

export function hashPassword(password: string): Promise<string> {
  return hash(password, COST);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** Verified against when no account matches, so a wrong e-mail costs as long as a wrong password. */
let decoyHash: Promise<string> | undefined;
export async function spendPasswordCheck(password: string): Promise<void> {
  decoyHash ??= hashPassword('no account has this password');
  await verifyPassword(await decoyHash, password);
}
