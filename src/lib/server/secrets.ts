import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

export { newId, randomString } from './db/ids';

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
