import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { getDb } from '$lib/server/db';
import { listOutboxMessages } from '$lib/server/db/outbox';
import { requireOutbox } from '../guard';

/** The outbox as JSON for tests and scripts: ?to=<address> filters, newest first. */
export const GET: RequestHandler = async (event) => {
	await requireOutbox(event);
	const to = event.url.searchParams.get('to') ?? undefined;
	const messages = await listOutboxMessages(getDb(), { to, limit: 200 });
	return json({
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
