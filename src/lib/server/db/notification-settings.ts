import type { DB } from './schema';

/** The e-mails a person can turn off, one switch each. */
export const NOTIFICATION_KINDS = [
	'mention',
	'reply',
	'submitted',
	'checked',
	'approved',
	'returned'
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];
export type NotificationSettings = Record<NotificationKind, boolean>;

export const DEFAULT_NOTIFICATION_SETTINGS: Readonly<NotificationSettings> = Object.freeze({
	mention: true,
	reply: true,
	submitted: true,
	checked: true,
	approved: true,
	returned: true
});

const COLUMN = {
	mention: 'on_mention',
	reply: 'on_reply',
	submitted: 'on_submitted',
	checked: 'on_checked',
	approved: 'on_approved',
	returned: 'on_returned'
} as const;

/** A person's settings (everything on when they never changed them). */
export async function getNotificationSettings(
	db: DB,
	userId: string
): Promise<NotificationSettings> {
	const row = await db
		.selectFrom('notification_settings')
		.selectAll()
		.where('user_id', '=', userId)
		.executeTakeFirst();
	if (!row) return { ...DEFAULT_NOTIFICATION_SETTINGS };
	return Object.fromEntries(
		NOTIFICATION_KINDS.map((k) => [k, row[COLUMN[k]] === 1])
	) as NotificationSettings;
}

export async function setNotificationSettings(
	db: DB,
	userId: string,
	settings: NotificationSettings,
	now = Date.now()
): Promise<void> {
	const values = Object.fromEntries(
		NOTIFICATION_KINDS.map((k) => [COLUMN[k], settings[k] ? 1 : 0])
	) as Record<(typeof COLUMN)[NotificationKind], number>;
	await db
		.insertInto('notification_settings')
		.values({ user_id: userId, ...values, updated_at: now })
		.onConflict((oc) => oc.column('user_id').doUpdateSet({ ...values, updated_at: now }))
		.execute();
}

/** Of these people, those who want mails of this kind. */
export async function wantsMail(
	db: DB,
	userIds: readonly string[],
	kind: NotificationKind
): Promise<Set<string>> {
	if (userIds.length === 0) return new Set();
	const off = await db
		.selectFrom('notification_settings')
		.select('user_id')
		.where('user_id', 'in', userIds)
		.where(COLUMN[kind], '=', 0)
		.execute();
	const no = new Set(off.map((r) => r.user_id));
	return new Set(userIds.filter((u) => !no.has(u)));
}
