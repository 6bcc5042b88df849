import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	cleanText,
	controlCharProblem,
	describeControlChar,
	findControlChar,
	hasControlChars,
	plainText,
	withoutControlChars
} from './plain-text';

describe('control characters in text', () => {
	it('refuses every C0 control and DEL on one line, naming the field, the character and what to send', () => {
		for (let code = 0; code < 32; code++)
			expect(findControlChar(`ab${String.fromCharCode(code)}c`, 'line')).toEqual({
				index: 2,
				code
			});
		expect(findControlChar('a\u007fb')).toEqual({ index: 1, code: 127 });
		expect(controlCharProblem('\u0000abc', 'The title')).toBe(
			'The title contains the control character U+0000 (NUL) at character 1. Send plain text on one line: letters, digits, punctuation and spaces.'
		);
		expect(controlCharProblem('a\u0007b', 'Tag')).toMatch(
			/^Tag contains the control character U\+0007 \(BEL\) at character 2\./
		);
	});

	it('lets a multi-line field keep tab, line feed and carriage return, and nothing else', () => {
		expect(findControlChar('line one\r\nline\ttwo\n', 'lines')).toBeNull();
		expect(findControlChar('line one\nline\u000btwo', 'lines')).toEqual({ index: 13, code: 11 });
		expect(findControlChar('\u001b[31m', 'lines')).toEqual({ index: 0, code: 27 });
		expect(controlCharProblem('a\u0000', 'The note', 'lines')).toMatch(/tabs and line breaks\.$/);
	});

	it('accepts ordinary text in any script, including C1 and format characters it does not cover', () => {
		for (const s of [
			'Kettle K-101 — jacket',
			'Überdruck 12 bar',
			'蒸気ドラム',
			'P = 1.2 MPa a',
			'',
			'\u00a0x',
			'\u0085'
		])
			expect(findControlChar(s)).toBeNull();
		expect(describeControlChar(0x1f)).toBe('U+001F');
	});

	it('agrees with a character-by-character reading on arbitrary text (seeded)', () => {
		fc.assert(
			fc.property(fc.string({ unit: 'binary', maxLength: 40 }), fc.boolean(), (s, multi) => {
				const bad = [...s].findIndex((ch) => {
					const c = ch.charCodeAt(0);
					return (c < 32 || c === 127) && !(multi && (c === 9 || c === 10 || c === 13));
				});
				const found = findControlChar(s, multi ? 'lines' : 'line');
				// findIndex counts code points, the regex UTF-16 units: compare the character found
				if (bad < 0) return found === null;
				return (
					found !== null &&
					s.charCodeAt(found.index) === [...s][bad].charCodeAt(0) &&
					!hasControlChars(withoutControlChars(s))
				);
			}),
			{ seed: 20261202, numRuns: 500 }
		);
	});

	it('is a zod rule that stops at the control character before later checks', () => {
		const title = plainText('The title', 'line', 'Enter a title.').min(1, {
			error: 'Enter a title.'
		});
		const r = title.safeParse('\u0000');
		expect(r.success).toBe(false);
		expect(r.error?.issues.map((i) => i.message)).toEqual([
			expect.stringMatching(/^The title contains the control character U\+0000/)
		]);
		expect(title.safeParse(5).error?.issues[0].message).toBe('Enter a title.');
		expect(title.parse('Flash tank')).toBe('Flash tank');
	});

	it('cleans text stored before the rule the way the rule would have let it in', () => {
		expect(cleanText('a\u0000b\tc\r\nd\u007f', 'line')).toBe('ab c  d');
		expect(cleanText('a\u0000b\tc\r\nd\u007f', 'lines')).toBe('ab\tc\r\nd');
		fc.assert(
			fc.property(
				fc.string({ unit: 'binary', maxLength: 30 }),
				fc.constantFrom('line' as const, 'lines' as const),
				(s, kind) => findControlChar(cleanText(s, kind), kind) === null
			),
			{ seed: 20261202, numRuns: 300 }
		);
	});
});
