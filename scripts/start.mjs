// Runs the built app (build/index.js, adapter-node) as `npm start` does.
//
// adapter-node takes the public origin from ORIGIN, or from PROTOCOL_HEADER/HOST_HEADER, and
// otherwise assumes https. A local run on plain http (the README's `npm start`) would then see
// every browser form post as cross-site and mark the session cookie Secure, so nobody could sign
// in. When neither ORIGIN nor PROTOCOL_HEADER is set, this server says what it is: every request
// is stamped with the scheme it really arrived on (always http here; a client's own value of the
// header is overwritten, never trusted). Behind a TLS proxy set ORIGIN, as the README says.
import http from 'node:http';

const SCHEME_HEADER = 'x-statewright-scheme';

if (!process.env.ORIGIN && !process.env.PROTOCOL_HEADER) {
	process.env.PROTOCOL_HEADER = SCHEME_HEADER;
	const createServer = http.createServer;
	http.createServer = (...args) => {
		const server = createServer(...args);
		// registered before adapter-node's own request handler, so the stamp is in place when it reads it
		server.prependListener('request', (req) => {
			req.headers[SCHEME_HEADER] = 'http';
		});
		return server;
	};
}

await import('../build/index.js');
