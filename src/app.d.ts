// See https://svelte.dev/docs/kit/types#app.d.ts
import type { SessionInfo, SessionUser } from '$lib/server/auth';
import type { TokenPrincipal } from '$lib/server/api-tokens';
import type { TeamAccess } from '$lib/server/access';
import type { DB } from '$lib/server/db/schema';

declare global {
	namespace App {
		interface Error {
			message: string;
			/** stable machine-readable code, e.g. 'not-found', 'forbidden' */
			code?: string;
			/** reference for an unexpected error, to find it in the server log */
			ref?: string;
		}
		interface Locals {
			/** the signed-in person (cookie session), or null */
			user: SessionUser | null;
			session: SessionInfo | null;
			/** an API token principal (only on /api/v1/* with Authorization: Bearer), or null */
			token: TokenPrincipal | null;
			/** on GET and HEAD: each team's access, looked up once for all the request's loads (guard.ts) */
			teamAccess?: Map<string, { db: DB; access: Promise<TeamAccess | null> }>;
		}
		// interface PageData {}
		// interface PageState {}
		// interface Platform {}
	}
}

export {};
