import { error, type RequestEvent } from '@sveltejs/kit';
import { config } from '$lib/server/config';
import { requireAnyOwner } from '$lib/server/guard';

/**
 * The outbox exists only while the local fake SMTP server catches mail (SMTP_URL unset) and dev
 * tools are on (NODE_ENV is not 'production', or STATEWRIGHT_DEV_TOOLS=1). Otherwise it is a
 * plain 404. Owners of any team may read it.
 */
export async function requireOutbox(event: Pick<RequestEvent, 'locals' | 'url'>) {
	if (!config().devTools) error(404, { code: 'not-found', message: 'Not found' });
	return requireAnyOwner(event);
}
