// Passwords are hashed with argon2id (OWASP's first choice for password storage).
import { hash, verify } from '@node-rs/argon2';

// Algorithm 2 = argon2id in @node-rs/argon2's enum; the const enum cannot be imported under
// isolatedModules, so the number is spelled out.
const OPTIONS = { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => hash(password, OPTIONS);

export async function verifyPassword(hashed: string, password: string): Promise<boolean> {
	try {
		return await verify(hashed, password);
	} catch {
		return false;
	}
}

/** A hash to verify against when the account does not exist, so timing reveals nothing. */
let decoy: Promise<string> | undefined;
export const decoyHash = () => (decoy ??= hashPassword('no such account, no such password'));
