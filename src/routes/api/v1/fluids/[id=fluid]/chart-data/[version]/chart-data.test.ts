/**
 * GET /api/v1/fluids/{id}/chart-data/{version} through its handler: the dome and the fluid list
 * under a content-versioned URL, immutable for a year, with a strong ETag and 304; another version
 * is a 404 naming the current URL; an unknown fluid a 404 listing the fluids.
 */
import { describe, expect, it } from 'vitest';
import type { ChartData } from '$lib/chart-data';
import { chartDataRef, fluidNames } from '$lib/server/chart-data';
import { GET } from './+server';

async function get(id: string, version: string, headers: Record<string, string> = {}) {
	const url = new URL(`http://127.0.0.1/api/v1/fluids/${id}/chart-data/${version}`);
	const event = {
		request: new Request(url, { headers }),
		url,
		getClientAddress: () => '127.0.0.9',
		params: { id, version },
		locals: {}
	} as unknown as Parameters<typeof GET>[0];
	return GET(event);
}

describe('GET /api/v1/fluids/{id}/chart-data/{version}', () => {
	it('serves the dome and the fluid list under the version the page names, immutable', async () => {
		const ref = chartDataRef('Water');
		expect(ref.fluid).toBe('water');
		const version = ref.url.split('/').at(-1) as string;
		expect(ref.url).toBe(`/api/v1/fluids/water/chart-data/${version}`);
		const res = await get('water', version);
		expect(res.status).toBe(200);
		expect(res.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
		expect(res.headers.get('etag')).toBe(`"${version}"`);
		const data = (await res.json()) as ChartData;
		expect(data.fluid).toBe('water');
		expect(data.saturationError).toBeNull();
		// python3-iapws 1.5 (Debian), IAPWS95(T=273.16, x=0): P = 611.6547710069761 Pa, ρ = 999.7925200316946 kg/m³
		const first = data.saturation!.liquid[0];
		expect(first.T).toBeCloseTo(273.16, 9);
		expect(first.P).toBeCloseTo(611.6547710069761, 3);
		expect(first.rho).toBeCloseTo(999.7925200316946, 5);
		expect(data.fluids.map((f) => f.id)).toContain('r134a');
		expect(fluidNames().water).toBe(data.fluids.find((f) => f.id === 'water')!.name);
	});

	it('answers 304 to a matching If-None-Match', async () => {
		const version = chartDataRef('water').url.split('/').at(-1) as string;
		const res = await get('water', version, { 'if-none-match': `W/"x", "${version}"` });
		expect(res.status).toBe(304);
		expect(res.headers.get('etag')).toBe(`"${version}"`);
		expect(await res.text()).toBe('');
	});

	it('refuses another version with a 404 that names the current URL', async () => {
		const res = await get('water', 'not-the-version');
		expect(res.status).toBe(404);
		const body = (await res.json()) as { error: { code: string; message: string } };
		expect(body.error.code).toBe('unknown-version');
		expect(body.error.message).toContain(chartDataRef('water').url);
	});

	it('refuses an unknown fluid with a 404 listing the fluids', async () => {
		const res = await get('unobtainium', 'abc');
		expect(res.status).toBe(404);
		const body = (await res.json()) as { error: { code: string; message: string } };
		expect(body.error.code).toBe('unknown-fluid');
		expect(body.error.message).toContain('water');
	});

	it('gives each fluid its own version', () => {
		expect(chartDataRef('water').url).not.toBe(
			chartDataRef('r134a').url.replace('/r134a/', '/water/')
		);
	});
});
