/**
 * GET /api/v1/fluids/{id}/saturation through its handler: the fluid's own dome, and for water with
 * formulation=if97 IAPWS-IF97's (if97/dome.ts); IF97 for another fluid or an unknown formulation is a
 * 400 saying what to give instead.
 */
import { describe, expect, it } from 'vitest';
import type { SaturationCurve } from '$lib/thermo';
import { answerCache } from '$lib/server/compute/http';
import { callRoute } from '$lib/server/compute/testing';
import { GET } from './+server';

const get = (id: string, query: string) =>
	callRoute(GET, `/api/v1/fluids/${id}/saturation?${query}`, { params: { id } });

describe('GET /api/v1/fluids/{id}/saturation', () => {
	it('gives water’s dome by IAPWS-IF97 when asked, the fluid’s own otherwise', async () => {
		answerCache.clear();
		const r = await get('water', 'points=20&formulation=if97');
		expect(r.status).toBe(200);
		const d = r.body as SaturationCurve;
		expect(d.formulation).toBe('if97');
		expect(d.stopsAt).toBe(643.15);
		expect(d.liquid).toHaveLength(20);
		// python3-iapws 1.5.2: IAPWS97(T=643.15, x=1).P = 21.043367 MPa (Eq. 30); IAPWS95 gives 21.043563 MPa
		expect(Math.abs(d.vapor[19].P - 21.043367e6)).toBeLessThan(2);
		const own = (await get('water', 'points=20')).body as SaturationCurve;
		expect(own.formulation).toBeUndefined();
		expect(own.liquid.at(-1)!.T).toBeGreaterThan(647);
		expect((await get('water', 'points=20&formulation=iapws95')).body).toEqual(own);
	});

	it('refuses IF97 for another fluid and an unknown formulation with a 400', async () => {
		const r = await get('nitrogen', 'formulation=if97');
		expect(r.status).toBe(400);
		expect(JSON.stringify(r.body)).toMatch(/water only/);
		const u = await get('water', 'formulation=iapws97');
		expect(u.status).toBe(400);
		expect((u.body as { error: { message: string } }).error.message).toMatch(/"iapws95".*"if97"/);
	});
});
