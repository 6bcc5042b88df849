/**
 * Checking a computed value against a figure a publication prints: as text, so that the number of
 * digits printed sets the tolerance. Shared by the transport tests.
 */
import { expect } from 'vitest';

/** |actual − printed| within half a unit of the printed figure's last digit, times `slack` */
export function printed(actual: number, text: string, what: string, slack = 1): void {
	const [mant, exp] = text.toLowerCase().split('e');
	const decimals = mant.includes('.') ? mant.split('.')[1].length : 0;
	const tol = 0.5 * 10 ** (-decimals + (exp ? Number(exp) : 0)) * slack * (1 + 1e-9);
	expect(
		Math.abs(actual - Number(text)),
		`${what}: ${actual} vs printed ${text}`
	).toBeLessThanOrEqual(tol);
}

/** half a unit of the last digit of a printed figure (no exponent) */
export function halfUnit(text: string): number {
	const decimals = text.includes('.') ? text.split('.')[1].length : 0;
	return 0.5 * 10 ** -decimals;
}
