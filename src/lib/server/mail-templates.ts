import { ROLE_LABEL, type Role } from '$lib/roles';
import { STEPS } from '$lib/revisions/steps';

/**
 * The mails Statewright sends, each as plain text and a simple HTML version. Links are absolute
 * (built from ORIGIN or the request's origin by the caller).
 */

export interface Composed {
	subject: string;
	text: string;
	html: string;
}

function esc(s: string): string {
	return s.replace(
		/[&<>"']/g,
		(c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!
	);
}

function when(ms: number): string {
	return new Date(ms).toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
}

function layout(
	title: string,
	paragraphs: string[],
	action: { label: string; url: string },
	footnote: string
): string {
	const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${p}</p>`).join('');
	return `<!doctype html><html><body style="margin:0;background:#f4efe4;font-family:'IBM Plex Sans',Segoe UI,Helvetica,Arial,sans-serif;color:#2a2825">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="padding:28px 12px"><tr><td align="center">
<table role="presentation" width="520" cellpadding="0" cellspacing="0" style="max-width:520px;background:#fbf8f1;border:1px solid #d6ccb8;border-radius:6px">
<tr><td style="padding:18px 24px;border-bottom:1px solid #d6ccb8;font-weight:600;letter-spacing:.02em">Statewright</td></tr>
<tr><td style="padding:22px 24px 8px;font-size:15px;line-height:22px">
<h1 style="font-size:19px;line-height:26px;margin:0 0 14px;font-weight:600">${esc(title)}</h1>${body}
<p style="margin:20px 0 22px"><a href="${esc(action.url)}" style="background:#3346b8;color:#ffffff;text-decoration:none;padding:10px 16px;border-radius:4px;display:inline-block">${esc(action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#5e5951">If the button does not work, paste this address into your browser:<br><span style="font-family:'JetBrains Mono',Consolas,monospace;word-break:break-all">${esc(action.url)}</span></p>
</td></tr>
<tr><td style="padding:12px 24px 18px;border-top:1px solid #d6ccb8;font-size:12px;line-height:18px;color:#5e5951">${esc(footnote)}</td></tr>
</table></td></tr></table></body></html>`;
}

function plain(
	title: string,
	paragraphs: string[],
	action: { label: string; url: string },
	footnote: string
): string {
	const strip = (s: string) =>
		s
			.replace(/<[^>]+>/g, '')
			.replace(/&amp;/g, '&')
			.replace(/&lt;/g, '<')
			.replace(/&gt;/g, '>')
			.replace(/&quot;/g, '"')
			.replace(/&#39;/g, "'");
	return [
		title,
		'',
		...paragraphs.map(strip).flatMap((p) => [p, '']),
		`${action.label}:`,
		action.url,
		'',
		'— ',
		footnote,
		''
	].join('\n');
}

function compose(
	subject: string,
	title: string,
	paragraphs: string[],
	action: { label: string; url: string },
	footnote: string
): Composed {
	return {
		subject,
		text: plain(title, paragraphs, action, footnote),
		html: layout(title, paragraphs, action, footnote)
	};
}

export function verifyEmailMail(input: { name: string; url: string; expiresAt: number }): Composed {
	return compose(
		'Confirm your e-mail address for Statewright',
		'Confirm your e-mail address',
		[
			`Hello ${esc(input.name)},`,
			'please confirm that this address belongs to you. Owners can invite you to teams, and password reset links are sent here.',
			`The link works once, until ${esc(when(input.expiresAt))}.`
		],
		{ label: 'Confirm address', url: input.url },
		'You receive this because someone signed up for Statewright with this address. If that was not you, ignore this mail.'
	);
}

export function resetPasswordMail(input: {
	name: string;
	url: string;
	expiresAt: number;
}): Composed {
	return compose(
		'Reset your Statewright password',
		'Reset your password',
		[
			`Hello ${esc(input.name)},`,
			'someone asked to reset the password of your Statewright account. Follow the link to choose a new one; every signed-in device will be signed out.',
			`The link works once, until ${esc(when(input.expiresAt))}.`
		],
		{ label: 'Choose a new password', url: input.url },
		'If you did not ask for this, ignore this mail: your password stays as it is.'
	);
}

export function signUpAttemptMail(input: { name: string; url: string }): Composed {
	return compose(
		'Someone tried to sign up to Statewright with your address',
		'A sign-up with your address',
		[
			`Hello ${esc(input.name)},`,
			'someone just tried to create a Statewright account with this e-mail address. It already has an account — yours — so nothing was created and nothing about your account changed.',
			'If that was you, you do not need a second account: sign in, or if you have forgotten the password, reset it with the link below.'
		],
		{ label: 'Reset your password', url: input.url },
		'If it was not you, ignore this mail: your password stays as it is, and nobody was told that the address has an account.'
	);
}

export function inviteMail(input: {
	teamName: string;
	inviterName: string;
	role: Role;
	url: string;
	expiresAt: number;
}): Composed {
	return compose(
		`${input.inviterName} invited you to ${input.teamName} on Statewright`,
		`Join ${input.teamName}`,
		[
			`${esc(input.inviterName)} invited you to the team <strong>${esc(input.teamName)}</strong> as <strong>${esc(ROLE_LABEL[input.role].toLowerCase())}</strong>.`,
			'Statewright is where the team follows a working fluid through its processes on T–v and P–v diagrams, reviews each path and exports it into design memos.',
			`The invitation works once, until ${esc(when(input.expiresAt))}, for an account with this e-mail address.`
		],
		{ label: 'Accept the invitation', url: input.url },
		'If you did not expect this invitation, ignore this mail.'
	);
}

export function passwordChangedMail(input: { name: string; url: string }): Composed {
	return compose(
		'Your Statewright password was changed',
		'Your password was changed',
		[
			`Hello ${esc(input.name)},`,
			'the password of your Statewright account was just changed and your other sessions were signed out.',
			'If this was not you, reset your password at once.'
		],
		{ label: 'Reset password', url: input.url },
		'This notice is sent whenever an account password changes.'
	);
}

// ---- review and sign-off notifications (revisions, review notes) ---------------------------------

/** Where a person turns notification mails off. */
function settingsNote(settingsUrl: string): string {
	return `You get this mail because of your notification settings in Statewright. Turn each kind off at ${settingsUrl}`;
}

function quote(text: string, max = 600): string {
	const t = text.length > max ? `${text.slice(0, max - 1)}…` : text;
	return `<span style="display:block;border-left:3px solid #d6ccb8;padding:2px 0 2px 10px;color:#2a2825;white-space:pre-wrap">${esc(t)}</span>`;
}

export interface NoteMailInput {
	/** recipient's name */
	name: string;
	/** who wrote */
	authorName: string;
	sheetTitle: string;
	teamName: string;
	/** "leg L2 (isochoric)", "state S3", "the sheet as a whole" */
	anchorText: string;
	body: string;
	/** opens the sheet at this note */
	url: string;
	settingsUrl: string;
}

export function mentionMail(input: NoteMailInput): Composed {
	return compose(
		`${input.authorName} mentioned you on ${input.sheetTitle}`,
		`You were mentioned in a review note`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.authorName)} mentioned you in a review note on <strong>${esc(input.anchorText)}</strong> of the sheet <strong>${esc(input.sheetTitle)}</strong> (${esc(input.teamName)}):`,
			quote(input.body)
		],
		{ label: 'Open the note', url: input.url },
		settingsNote(input.settingsUrl)
	);
}

export function replyMail(input: NoteMailInput): Composed {
	return compose(
		`${input.authorName} replied to your note on ${input.sheetTitle}`,
		`A reply to your review note`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.authorName)} replied to your review note on <strong>${esc(input.anchorText)}</strong> of the sheet <strong>${esc(input.sheetTitle)}</strong> (${esc(input.teamName)}):`,
			quote(input.body)
		],
		{ label: 'Open the thread', url: input.url },
		settingsNote(input.settingsUrl)
	);
}

export interface RevisionMailInput {
	name: string;
	/** who did it */
	actorName: string;
	sheetTitle: string;
	teamName: string;
	revision: number;
	/** the revision's message, or the checker's note */
	text: string;
	url: string;
	settingsUrl: string;
	/** checked or approved over open review notes: the reason given and how many were open */
	override?: { reason: string; openNotes: number } | null;
}

function overrideLines(input: RevisionMailInput): string[] {
	const o = input.override;
	if (!o) return [];
	return [
		`This was done over <strong>${o.openNotes} open review note${o.openNotes === 1 ? '' : 's'}</strong>, for this reason:`,
		quote(o.reason)
	];
}

/** "<strong>Rev 2</strong> of the sheet <strong>V-204</strong> (Team)", HTML-escaped. */
function revisionOfSheet(input: RevisionMailInput): string {
	return `<strong>Rev ${input.revision}</strong> of the sheet <strong>${esc(input.sheetTitle)}</strong> (${esc(input.teamName)})`;
}

export function submittedMail(input: RevisionMailInput): Composed {
	return compose(
		`Rev ${input.revision} of ${input.sheetTitle} is ready for your check`,
		`A revision to check`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.actorName)} ${STEPS.submit.didTo(revisionOfSheet(input))}. The revision message:`,
			quote(input.text),
			`Write review notes on its legs and states, then ${STEPS.check.doTo('it')} or ${STEPS.return.doTo('it')}.`
		],
		{ label: `Check Rev ${input.revision}`, url: input.url },
		settingsNote(input.settingsUrl)
	);
}

export function checkedMail(input: RevisionMailInput): Composed {
	return compose(
		`Rev ${input.revision} of ${input.sheetTitle} was ${STEPS.check.past}`,
		`Your revision was ${STEPS.check.past}`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.actorName)} ${STEPS.check.didTo(revisionOfSheet(input))}. It now waits for an owner's approval.`,
			...(input.text ? [quote(input.text)] : []),
			...overrideLines(input)
		],
		{ label: `Open Rev ${input.revision}`, url: input.url },
		settingsNote(input.settingsUrl)
	);
}

export function approvedMail(input: RevisionMailInput): Composed {
	return compose(
		`Rev ${input.revision} of ${input.sheetTitle} was ${STEPS.approve.past}`,
		`Your revision was ${STEPS.approve.past}`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.actorName)} ${STEPS.approve.didTo(revisionOfSheet(input))}. The revision is now locked; further edits start a new draft based on it.`,
			...(input.text ? [quote(input.text)] : []),
			...overrideLines(input)
		],
		{ label: `Open Rev ${input.revision}`, url: input.url },
		settingsNote(input.settingsUrl)
	);
}

export function returnedMail(input: RevisionMailInput): Composed {
	return compose(
		`Rev ${input.revision} of ${input.sheetTitle} was ${STEPS.return.past} to you`,
		`Your revision was ${STEPS.return.past}`,
		[
			`Hello ${esc(input.name)},`,
			`${esc(input.actorName)} ${STEPS.return.didTo(revisionOfSheet(input))} with this note:`,
			quote(input.text),
			'Answer the review notes, fix the sheet and save a new revision.'
		],
		{ label: 'Open the sheet', url: input.url },
		settingsNote(input.settingsUrl)
	);
}
