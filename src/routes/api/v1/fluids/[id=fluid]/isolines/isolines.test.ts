/**
 * GET /api/v1/fluids/{id}/isolines with formulation: water's background lines by IAPWS-IF97
 * (if97Isolines, checked against python3-iapws in src/lib/thermo/if97/legs.test.ts); IF97 for another
 * fluid or an unknown formulation is a 400 saying what to give instead.
 */
import { describe, expect, it } from 'vitest';
import { if97Isolines, isolines, type Isoline } from '$lib/thermo';
import { answerCache } from '$lib/server/compute/http';
import { callRoute } from '$lib/server/compute/testing';
import { GET } from './+server';

const get = (id: string, query: string) =>
	callRoute(GET, `/api/v1/fluids/${id}/isolines?${query}`, { params: { id } });

describe('GET /api/v1/fluids/{id}/isolines?formulation=', () => {
	it('gives water’s lines by IAPWS-IF97 when asked, the fluid’s own otherwise', async () => {
		answerCache.clear();
		const r = await get('water', 'kind=isotherm&values=400,700&points=40&formulation=if97');
		expect(r.status).toBe(200);
		const lines = (r.body as { lines: Isoline[] }).lines;
		expect(lines).toEqual(if97Isolines('isotherm', [400, 700], 40));
		const own = (await get('water', 'kind=isotherm&values=400,700&points=40')).body as {
			lines: Isoline[];
		};
		expect(own.lines).toEqual(isolines('water', 'isotherm', [400, 700], 40));
		expect(own.lines).not.toEqual(lines);
	});

	it('refuses IF97 for another fluid and an unknown formulation with a 400', async () => {
		const r = await get('nitrogen', 'kind=isobar&values=1e5&formulation=if97');
		expect(r.status).toBe(400);
		expect((r.body as { error: { message: string } }).error.message).toMatch(/water only/);
		const u = await get('water', 'kind=isobar&values=1e5&formulation=IF97');
		expect(u.status).toBe(400);
		expect((u.body as { error: { message: string } }).error.message).toMatch(/"iapws95".*"if97"/);
	});
});
