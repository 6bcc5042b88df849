import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/db';
import { getOutboxMessage } from '$lib/server/db/outbox';
import { requireOutbox } from '../../guard';

export const load: PageServerLoad = async (event) => {
	await requireOutbox(event);
	const m = await getOutboxMessage(getDb(), Number(event.params.id));
	if (!m) error(404, { code: 'not-found', message: 'No such message in the outbox.' });
	return {
		message: { id: m.id, from: m.from_header, to: m.to_header, subject: m.subject, text: m.text, hasHtml: m.html !== null, raw: m.raw, receivedAt: m.received_at }
	};
};
