import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/database';
import { listMailFor } from '$lib/server/db/outbox';
import { requireOutbox } from '../guard';

/** The signed-in person's own caught mail as JSON, newest first. Nobody else's, whatever is asked. */
export const GET: RequestHandler = async (event) => {
	const me = await requireOutbox(event);
	const messages = await listMailFor(getDb(), me.address, me.since);
	return json({
		address: me.address,
		messages: messages.map((m) => ({
			id: m.id,
			to: JSON.parse(m.envelope_to) as string[],
			from: m.from_header,
			subject: m.subject,
			text: m.text,
			receivedAt: m.received_at
		}))
	});
};
