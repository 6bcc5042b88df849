import { ROLE_LABEL, type Role } from '../roles';

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
	return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function when(ms: number): string {
	return new Date(ms).toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
}

function layout(title: string, paragraphs: string[], action: { label: string; url: string }, footnote: string): string {
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

function plain(title: string, paragraphs: string[], action: { label: string; url: string }, footnote: string): string {
	const strip = (s: string) => s.replace(/<[^>]+>/g, '').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'");
	return [title, '', ...paragraphs.map(strip).flatMap((p) => [p, '']), `${action.label}:`, action.url, '', '— ', footnote, ''].join('\n');
}

function compose(subject: string, title: string, paragraphs: string[], action: { label: string; url: string }, footnote: string): Composed {
	return { subject, text: plain(title, paragraphs, action, footnote), html: layout(title, paragraphs, action, footnote) };
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

export function resetPasswordMail(input: { name: string; url: string; expiresAt: number }): Composed {
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
