/**
 * Password hashing with argon2id (memory-hard), at OWASP's recommended minimum for argon2id
 * (Password Storage Cheat Sheet: 19 MiB, 2 passes, 1 lane). Tests use a much cheaper setting so
 * hundreds of accounts can be made quickly; the parameters travel inside each hash, so `verify`
 * reads whichever was used.
 */
import argon2 from 'argon2';

export type HashCost = 'standard' | 'test';

const COSTS: Record<HashCost, { memoryCost: number; timeCost: number; parallelism: number }> = {
  standard: { memoryCost: 19 * 1024, timeCost: 2, parallelism: 1 },
  test: { memoryCost: 1024, timeCost: 1, parallelism: 1 },
};

/** The cost for an environment: cheap only under test. */
export function hashCostFor(env: string): HashCost {
  return env === 'test' ? 'test' : 'standard';
}

export function hashPassword(password: string, cost: HashCost = 'standard'): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id, ...COSTS[cost] });
}

// A hash of a password nobody knows, checked when the e-mail is unknown so that a wrong e-mail
// and a wrong password take the same time to refuse.
const decoyHashes = new Map<HashCost, Promise<string>>();

/** True when `password` matches `hash`; with no hash, spends the same time and answers false. */
export async function verifyPassword(hash: string | null, password: string, cost: HashCost = 'standard'): Promise<boolean> {
  if (hash === null) {
    let decoy = decoyHashes.get(cost);
    if (!decoy) {
      decoy = hashPassword('decoy-password-for-unknown-accounts', cost);
      decoyHashes.set(cost, decoy);
    }
    await argon2.verify(await decoy, password);
    return false;
  }
  return argon2.verify(hash, password);
}
