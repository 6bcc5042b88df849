import { error, type RequestEvent } from '@sveltejs/kit';
import { config } from '$lib/server/config';
import { getDb } from '$lib/server/database';
import { getUserById } from '$lib/server/db/users';
import { requireUser } from '$lib/server/guard';

/**
 * The outbox exists only while the local fake SMTP server catches mail (SMTP_URL unset) and dev
 * tools are on (NODE_ENV is not 'production', or STATEWRIGHT_DEV_TOOLS=1). Otherwise it is a
 * plain 404. It is a mailbox, not an admin view: a signed-in person sees only the mail addressed to
 * their own address since their account was made — never anyone else's, whatever their role. The
 * whole catch is printed on the server's console for whoever runs it.
 */
export async function requireOutbox(
	event: Pick<RequestEvent, 'locals' | 'url'>
): Promise<{ address: string; since: number }> {
	if (!config().devTools) error(404, { code: 'not-found', message: 'Not found' });
	const user = requireUser(event);
	const row = await getUserById(getDb(), user.id);
	if (!row) error(404, { code: 'not-found', message: 'Not found' });
	return { address: row.email, since: row.created_at };
}
