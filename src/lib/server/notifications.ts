import type { DB } from './db/schema';
import type { FlowContext } from './auth';
import type { Composed } from './mail-templates';
import {
	NOTIFICATION_KINDS,
	wantsMail,
	type NotificationKind,
	type NotificationSettings
} from './db/notification-settings';
import { STEPS } from '$lib/revisions/steps';

/*
 * Review and sign-off mails: who gets one, honouring each person's settings, and the links in
 * them. Mail goes out after the change is committed; a mail that cannot be sent is logged and
 * never undoes the note or sign-off it reports.
 */

/** What a service needs to mail people: where links point and how to send. */
export type NotifyContext = Pick<FlowContext, 'origin' | 'send'>;

export interface Recipient {
	id: string;
	name: string;
	email: string;
}

export interface NotifyOutcome {
	sent: string[];
	/** turned off in the person's settings */
	optedOut: string[];
	failed: string[];
}

/** The sheet page. */
export function sheetPath(teamSlug: string, sheetId: string): string {
	return `/t/${teamSlug}/sheets/${sheetId}`;
}

/** Opens the sheet with this note's thread shown and scrolled to. */
export function notePath(teamSlug: string, sheetId: string, noteId: string): string {
	return `${sheetPath(teamSlug, sheetId)}?note=${noteId}#note-${noteId}`;
}

/** The read-only view of one revision. */
export function revisionPath(teamSlug: string, sheetId: string, number: number): string {
	return `${sheetPath(teamSlug, sheetId)}/revisions/${number}`;
}

export const SETTINGS_PATH = '/account#notifications';

/**
 * Sends `kind` mails to the recipients who have not turned that kind off (never to the person
 * who acted). Returns who got one.
 */
export async function notify(
	db: DB,
	ctx: NotifyContext | undefined,
	kind: NotificationKind,
	recipients: readonly Recipient[],
	actorId: string | null,
	compose: (r: Recipient) => Composed
): Promise<NotifyOutcome> {
	const outcome: NotifyOutcome = { sent: [], optedOut: [], failed: [] };
	const unique = [
		...new Map(recipients.filter((r) => r.id !== actorId).map((r) => [r.id, r])).values()
	];
	if (!ctx || unique.length === 0) return outcome;
	const wanted = await wantsMail(
		db,
		unique.map((r) => r.id),
		kind
	);
	await Promise.all(
		unique.map(async (r) => {
			if (!wanted.has(r.id)) {
				outcome.optedOut.push(r.id);
				return;
			}
			try {
				await ctx.send({ to: r.email, ...compose(r) });
				outcome.sent.push(r.id);
			} catch (e) {
				console.error(`[statewright] ${kind} mail to ${r.email} failed:`, e);
				outcome.failed.push(r.id);
			}
		})
	);
	return outcome;
}

/** What each switch on the account page means. */
export const NOTIFICATION_LABELS: Record<NotificationKind, { label: string; hint: string }> = {
	mention: { label: 'Someone mentions me in a review note', hint: '@Your Name in a note or reply' },
	reply: { label: 'Someone replies to a review note I started', hint: 'replies in your threads' },
	submitted: {
		label: `A revision is ${STEPS.submit.done} for my check`,
		hint: 'checkers and owners'
	},
	checked: {
		label: `My revision is ${STEPS.check.done}`,
		hint: 'revisions you saved or submitted'
	},
	approved: {
		label: `My revision is ${STEPS.approve.done}`,
		hint: 'revisions you saved or submitted'
	},
	returned: { label: `My revision is ${STEPS.return.done} to me`, hint: 'with the checker’s note' }
};

/** The account page's form: a checkbox per kind, present when on. */
export function settingsFromForm(form: FormData): NotificationSettings {
	return Object.fromEntries(
		NOTIFICATION_KINDS.map((k) => [k, form.get(k) === 'on' || form.get(k) === '1'])
	) as NotificationSettings;
}
