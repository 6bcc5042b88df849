/**
 * The sign-off workflow, defined once: which steps there are, who takes them, from which status to
 * which, and every word the product says about them — the buttons and confirmations on the sheet
 * page, the status chips and title blocks, the sign-off log, the server's refusals and the
 * notification mails all take their words from here (client-safe: no server imports).
 *
 *   draft ──submit──▶ in check ──check──▶ checked ──approve──▶ approved (locked)
 *     ▲                  │                   │
 *     └──return/withdraw─┴───────return──────┘
 */
import type { Capability } from '$lib/roles';
import type { SheetStatus } from '$lib/sheets/types';

export type { SheetStatus };

/** A status in words. */
export interface StatusWords {
	/** on a chip or in a title block: "In check" */
	label: string;
	/** after "Rev 2 is …" in a sentence: "in check", "a draft" */
	phrase: string;
}

export const STATUS: Record<SheetStatus, StatusWords> = {
	draft: { label: 'Draft', phrase: 'a draft' },
	'in-check': { label: 'In check', phrase: 'in check' },
	checked: { label: 'Checked', phrase: 'checked' },
	approved: { label: 'Approved', phrase: 'approved (and locked)' }
};

/** A draft that went back because someone other than its author returned it (not withdrawn). */
export const RETURNED_LABEL = 'Returned';

/** The sign-off log's kinds of event (each step logs one; saving and restoring log theirs). */
export type SignOffEventKind =
	'saved' | 'submitted' | 'returned' | 'checked' | 'approved' | 'restored';

export const SIGN_OFF_ACTIONS = ['submit', 'withdraw', 'check', 'return', 'approve'] as const;
export type SignOffAction = (typeof SIGN_OFF_ACTIONS)[number];

export interface SignOffStep {
	/** who may take it (the server enforces it; the page hides what the role cannot do) */
	cap: Capability;
	from: readonly SheetStatus[];
	to: SheetStatus;
	/** what the sign-off log records */
	event: Exclude<SignOffEventKind, 'saved' | 'restored'>;
	/** the button that takes it: "Mark checked" */
	button: string;
	/** what the revision is once it is taken, after "cannot be" or "is not … yet": "marked checked" */
	done: string;
	/** the plain past participle, after "Rev 2 of … was": "checked" */
	past: string;
	/** the confirmation after "Rev 2 ": "marked checked", "approved and locked" */
	result: string;
	/** taking it, in a sentence: the step done to `what` ("mark Rev 2 checked") */
	doTo: (what: string) => string;
	/** the same in the past tense ("marked Rev 2 checked") */
	didTo: (what: string) => string;
}

export const STEPS: Record<SignOffAction, SignOffStep> = {
	submit: {
		cap: 'sheet:edit',
		from: ['draft'],
		to: 'in-check',
		event: 'submitted',
		button: 'Submit for check',
		done: 'submitted',
		past: 'submitted',
		result: 'submitted for checking',
		doTo: (w) => `submit ${w} for checking`,
		didTo: (w) => `submitted ${w} for checking`
	},
	withdraw: {
		cap: 'sheet:edit',
		from: ['in-check'],
		to: 'draft',
		event: 'returned',
		button: 'Withdraw from checking',
		done: 'withdrawn',
		past: 'withdrawn',
		result: 'withdrawn from checking',
		doTo: (w) => `withdraw ${w} from checking`,
		didTo: (w) => `withdrew ${w} from checking`
	},
	check: {
		cap: 'sheet:check',
		from: ['in-check'],
		to: 'checked',
		event: 'checked',
		button: 'Mark checked',
		done: 'marked checked',
		past: 'checked',
		result: 'marked checked',
		doTo: (w) => `mark ${w} checked`,
		didTo: (w) => `marked ${w} checked`
	},
	return: {
		cap: 'sheet:check',
		from: ['in-check', 'checked'],
		to: 'draft',
		event: 'returned',
		button: 'Return to designer',
		done: 'returned',
		past: 'returned',
		result: 'returned to the designer',
		doTo: (w) => `return ${w} to the designer`,
		didTo: (w) => `returned ${w} to the designer`
	},
	approve: {
		cap: 'sheet:approve',
		from: ['checked'],
		to: 'approved',
		event: 'approved',
		button: 'Approve',
		done: 'approved',
		past: 'approved',
		result: 'approved and locked',
		doTo: (w) => `approve ${w}`,
		didTo: (w) => `approved ${w}`
	}
};

/** The sign-off log's entries in words, after the actor's name: "Priya Ramanathan marked checked". */
export const EVENT_WORDS: Record<SignOffEventKind, string> = {
	saved: 'saved',
	submitted: STEPS.submit.result,
	returned: STEPS.return.done,
	checked: STEPS.check.done,
	approved: STEPS.approve.done,
	restored: 'restored as the draft'
};

/** "marked checked" → "Marked checked". */
export function capitalized(words: string): string {
	return words.charAt(0).toUpperCase() + words.slice(1);
}

/** A step's name, as a route's path segment gives it. */
export function isSignOffAction(s: string): s is SignOffAction {
	return (SIGN_OFF_ACTIONS as readonly string[]).includes(s);
}
