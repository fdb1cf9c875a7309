import { hash, verify } from '@node-rs/argon2';

// @node-rs/argon2 defaults to argon2id with OWASP-recommended memory and time costs.
export const hashPassword = (password: string): Promise<string> => hash(password);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let dummy: Promise<string> | undefined;
/** Spends the same time as a real check, so unknown addresses cannot be told apart by timing. */
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummy ??= hashPassword('pitwall-dummy-password');
  await verifyPassword(await dummy, password);
  return false;
}
