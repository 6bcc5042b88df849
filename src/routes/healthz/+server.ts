import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { sql } from 'kysely';
import { getDb } from '$lib/server/database';

/** Liveness and readiness: the database answers. */
export const GET: RequestHandler = async () => {
	try {
		await sql`select 1`.execute(getDb());
		return json({ ok: true });
	} catch {
		return json(
			{ ok: false, error: { code: 'database', message: 'The database does not answer.' } },
			{ status: 503 }
		);
	}
};
