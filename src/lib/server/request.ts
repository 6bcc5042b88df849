import type { RequestEvent } from '@sveltejs/kit';
import type { ClientMeta, FlowContext } from './auth';
import { getMailer } from './mail';

/** The client's address (adapter-node: the socket, or ADDRESS_HEADER behind a proxy). */
export function clientIp(event: Pick<RequestEvent, 'getClientAddress'>): string | null {
	try {
		return event.getClientAddress();
	} catch {
		return null;
	}
}

export function clientMeta(event: RequestEvent): ClientMeta {
	return { ip: clientIp(event), userAgent: event.request.headers.get('user-agent') };
}

/** What account and team flows need from a request: where links point, how to mail, who asked. */
export function flowContext(event: RequestEvent): FlowContext {
	return {
		// adapter-node builds event.url from ORIGIN when it is set, so mails carry the public address
		origin: event.url.origin,
		send: async (message) => (await getMailer()).send(message),
		ip: clientIp(event)
	};
}
