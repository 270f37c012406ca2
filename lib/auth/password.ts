// argon2id with the parameters OWASP's password-storage cheat sheet lists as a minimum
// (m = 19 MiB, t = 2, p = 1) — about 50 ms a hash on these machines.
import { hash, verify } from "@node-rs/argon2";

const OPTIONS = {
  algorithm: 2, // Algorithm.Argon2id; the enum is a `const enum`, unusable with isolatedModules
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false; // a malformed stored hash never lets anyone in
  }
}

// Compared against when the account does not exist, so both cases take the same time.
let dummy: Promise<string> | undefined;
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummy ??= hashPassword("joulebook-timing-equaliser");
  await verifyPassword(await dummy, password);
  return false;
}
