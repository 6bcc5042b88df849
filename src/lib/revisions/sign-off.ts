/**
 * Sign-off records in words, shared by the server (revision records, review pages) and the
 * exports' title block, so neither side imports the other.
 */
import { capitalized, STATUS, STEPS } from './steps';

/** One person's part in sign-off: who and when (null until they have signed). */
export interface SignOffPerson {
	name: string | null;
	/** Unix ms */
	at: number | null;
}

/** The title block's sign-off fields: "Designed", "Checked", "Approved". */
export const SIGNED_LABEL: Record<keyof SignOff, string> = {
	designer: 'Designed',
	checker: STATUS.checked.label,
	approver: STATUS.approved.label
};

/** Who signed what, from the revision record. */
export interface SignOff {
	designer: SignOffPerson;
	checker: SignOffPerson;
	approver: SignOffPerson;
}

/** A sign-off log entry, as the revisions API lists it. */
export interface SignOffEvent {
	number: number;
	kind: string;
	actor: string;
	at: number;
	override?: { reason: string; openNotes: number } | null;
}

/** "2026-01-06" (UTC), or '' for a step not taken. */
export function isoDate(ms: number | null): string {
	return ms === null ? '' : new Date(ms).toISOString().slice(0, 10);
}

/**
 * The checks and approvals of revision `number` taken over open review notes, in words, oldest
 * first: "Marked checked by Priya Ramanathan on 2026-01-06 over 2 open review notes: “…”".
 */
export function signOffOverrides(events: readonly SignOffEvent[], number: number): string[] {
	return events
		.filter((e) => e.number === number && e.override)
		.sort((a, b) => a.at - b.at)
		.map((e) => {
			const n = e.override!.openNotes;
			return `${capitalized(e.kind === 'approved' ? STEPS.approve.done : STEPS.check.done)} by ${e.actor} on ${isoDate(e.at)} over ${n} open review note${n === 1 ? '' : 's'}: “${e.override!.reason}”`;
		});
}
