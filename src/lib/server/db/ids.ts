import { randomBytes } from 'node:crypto';

// 32 symbols without look-alikes (no l, o, 0, 1); 256 is a multiple of 32, so `byte % 32` is unbiased.
const ALPHABET = 'abcdefghijkmnpqrstuvwxyz23456789';

/** A random string of `length` symbols (5 bits each). */
export function randomString(length: number): string {
	const bytes = randomBytes(length);
	let out = '';
	for (const b of bytes) out += ALPHABET[b % 32];
	return out;
}

/** A row id: 16 symbols, 80 random bits — unguessable, so ids in forms cannot be enumerated. */
export function newId(): string {
	return randomString(16);
}
