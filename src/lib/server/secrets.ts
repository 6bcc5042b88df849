import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

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

/** A secret for a link or a bearer token: 256 random bits, URL-safe. */
export function newSecret(): string {
	return randomBytes(32).toString('base64url');
}

/** SHA-256 hex digest; secrets are stored only in this form. */
export function sha256(value: string): string {
	return createHash('sha256').update(value, 'utf8').digest('hex');
}

export function safeEqual(a: string, b: string): boolean {
	const x = Buffer.from(a);
	const y = Buffer.from(b);
	return x.length === y.length && timingSafeEqual(x, y);
}
