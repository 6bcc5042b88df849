import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/db';
import { clearOutbox, listOutboxMessages } from '$lib/server/db/outbox';
import { requireOutbox } from '../guard';

export const load: PageServerLoad = async (event) => {
	await requireOutbox(event);
	const to = event.url.searchParams.get('to') ?? undefined;
	const messages = await listOutboxMessages(getDb(), { to, limit: 200 });
	return { to: to ?? '', messages: messages.map((m) => ({ id: m.id, to: m.to_header, subject: m.subject, receivedAt: m.received_at })) };
};

export const actions: Actions = {
	clear: async (event) => {
		await requireOutbox(event);
		await clearOutbox(getDb());
		return { cleared: true };
	}
};
