import { z } from 'zod';

/*
 * The one rule for control characters in text people and scripts send (client-safe: the sheet
 * document schema uses it too). C0 controls (U+0000–U+001F) and DEL (U+007F) are never stored:
 * a text field holding one is refused with a 4xx naming the field, the character and what to
 * send instead. A multi-line field (note and reply bodies, revision and sign-off notes,
 * descriptions) allows tab, line feed and carriage return; a one-line field (titles, names, tags,
 * file names, ids, search text) allows none of them.
 *
 *   title: plainText('The title', 'line', 'Enter a title for the sheet.').transform(…)
 *   const problem = controlCharProblem(value, 'The file name');  // string | null
 */

export type TextKind = 'line' | 'lines';

/* eslint-disable no-control-regex -- these patterns exist to find control characters */
const IN_LINE = /[\u0000-\u001f\u007f]/;
const IN_LINES = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
const ALL_CONTROLS = /[\u0000-\u001f\u007f]/g;
/* eslint-enable no-control-regex */

const NAMES: Record<number, string> = {
	0: 'NUL',
	7: 'BEL',
	8: 'backspace',
	9: 'tab',
	10: 'line break',
	13: 'carriage return',
	27: 'ESC',
	127: 'DEL'
};

/** The first refused control character in `value`: its position (from 0) and code, or null. */
export function findControlChar(
	value: string,
	kind: TextKind = 'line'
): { index: number; code: number } | null {
	const m = (kind === 'lines' ? IN_LINES : IN_LINE).exec(value);
	return m ? { index: m.index, code: m[0].charCodeAt(0) } : null;
}

/** "U+0000 (NUL)", "U+0007 (BEL)", "U+001F". */
export function describeControlChar(code: number): string {
	const hex = `U+${code.toString(16).toUpperCase().padStart(4, '0')}`;
	return NAMES[code] ? `${hex} (${NAMES[code]})` : hex;
}

/**
 * The message for a text holding a control character, or null when it holds none. `label` names
 * the field as the reader knows it ("The title", "body", "The file name"); `instead` replaces the
 * sentence saying what to send.
 */
export function controlCharProblem(
	value: string,
	label: string,
	kind: TextKind = 'line',
	instead?: string
): string | null {
	const found = findControlChar(value, kind);
	if (!found) return null;
	const allowed =
		instead ??
		(kind === 'lines'
			? 'Send plain text: letters, digits, punctuation, spaces, tabs and line breaks.'
			: 'Send plain text on one line: letters, digits, punctuation and spaces.');
	return `${label} contains the control character ${describeControlChar(found.code)} at character ${found.index + 1}. ${allowed}`;
}

/** Whether a text holds any C0 control character or DEL (tab and line breaks included). */
export function hasControlChars(value: string): boolean {
	return IN_LINE.test(value);
}

/** `value` with every C0 control and DEL removed (for echoing refused input back safely). */
export function withoutControlChars(value: string): string {
	return value.replace(ALL_CONTROLS, '');
}

/**
 * `value` as the rule would have let it in, for text stored before the rule: in a one-line field
 * tabs and line breaks become spaces; every other refused character is dropped.
 */
export function cleanText(value: string, kind: TextKind = 'line'): string {
	return kind === 'lines'
		? value.replace(new RegExp(IN_LINES.source, 'g'), '')
		: value.replace(/[\t\n\r]/g, ' ').replace(ALL_CONTROLS, '');
}

/**
 * A zod string that refuses control characters (see the module comment); `typeError` is the
 * message for a value that is not text at all. Chain trimming, lengths and the rest after it.
 */
export function plainText(
	label: string,
	kind: TextKind = 'line',
	typeError = `${label} must be text.`
) {
	return z.string({ error: typeError }).superRefine((s, ctx) => {
		const problem = controlCharProblem(s, label, kind);
		if (problem) ctx.addIssue({ code: 'custom', message: problem, input: s, continue: false });
	});
}
