import { hash, verify } from '@node-rs/argon2';

export const hashPassword = (password: string): Promise<string> => hash(password);

export const verifyPassword = (stored: string, password: string): Promise<boolean> => verify(stored, password).catch(() => false);

let decoy: Promise<string> | undefined;

/**
 * Spends the time of a real verification when the e-mail is unknown, so the
 * response time does not tell whether an account exists.
 */
export async function spendVerifyTime(password: string): Promise<void> {
  decoy ??= hash('decoy password that matches nothing');
  await verify(await decoy, password).catch(() => false);
}
