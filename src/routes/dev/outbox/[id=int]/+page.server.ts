import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { getMailFor } from '$lib/server/db/outbox';
import { requireOutbox } from '../../guard';

export const load: PageServerLoad = async (event) => {
	const me = await requireOutbox(event);
	// someone else's message is as absent as one that never existed
	const m = await getMailFor(getDb(), Number(event.params.id), me.address, me.since);
	if (!m) error(404, { code: 'not-found', message: 'No such message in your outbox.' });
	return {
		message: {
			id: m.id,
			from: m.from_header,
			to: m.to_header,
			subject: m.subject,
			text: m.text,
			hasHtml: m.html !== null,
			raw: m.raw,
			receivedAt: m.received_at
		}
	};
};
