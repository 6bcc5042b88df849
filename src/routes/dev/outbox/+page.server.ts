import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { clearMailFor, listMailFor } from '$lib/server/db/outbox';
import { requireOutbox } from '../guard';

export const load: PageServerLoad = async (event) => {
	const me = await requireOutbox(event);
	const messages = await listMailFor(getDb(), me.address, me.since);
	return {
		address: me.address,
		messages: messages.map((m) => ({
			id: m.id,
			to: m.to_header,
			subject: m.subject,
			receivedAt: m.received_at
		}))
	};
};

export const actions: Actions = {
	clear: async (event) => {
		const me = await requireOutbox(event);
		return { cleared: await clearMailFor(getDb(), me.address) };
	}
};
