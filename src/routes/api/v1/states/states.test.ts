/**
 * POST /api/v1/states through its handler: hint, near and window reach the engine; unknown body
 * fields and any query parameter are refused with a 400 naming them; the state carries the
 * derived properties and precision.
 */
import { describe, expect, it } from 'vitest';
import { POST } from './+server';

async function post(
	body: unknown,
	query = ''
	// eslint-disable-next-line @typescript-eslint/no-explicit-any -- the checks read the JSON answer field by field
): Promise<{ status: number; json: Record<string, any> }> {
	const url = new URL(`http://127.0.0.1/api/v1/states${query}`);
	const request = new Request(url, {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify(body)
	});
	const event = {
		request,
		url,
		getClientAddress: () => '127.0.0.9',
		params: {},
		locals: {}
	} as unknown as Parameters<typeof POST>[0];
	const res = await POST(event);
	return { status: res.status, json: await res.json() };
}

describe('POST /api/v1/states', () => {
	it('answers with precision and derived properties', async () => {
		const r = await post({ fluid: 'water', inputs: { T: 300, P: 1e5 } });
		expect(r.status).toBe(200);
		expect(r.json.state.precision.T).toBeLessThan(1e-15);
		expect(r.json.state.Z).toBeGreaterThan(0);
		expect(r.json.state.kappaT).toBeGreaterThan(0);
	});

	it('takes near and window to choose among several states', async () => {
		const ref = (await post({ fluid: 'water', inputs: { T: 275, P: 1e6 } })).json.state;
		const amb = await post({ fluid: 'water', inputs: { T: 275, s: ref.s } });
		expect(amb.status).toBe(422);
		expect(amb.json.error.code).toBe('ambiguous-state');
		const byNear = await post({ fluid: 'water', inputs: { T: 275, s: ref.s }, near: { P: 1e6 } });
		expect(byNear.status).toBe(200);
		expect(Math.abs(byNear.json.state.P - 1e6) / 1e6).toBeLessThan(1e-3);
		const byWindow = await post({
			fluid: 'water',
			inputs: { T: 275, s: ref.s },
			window: { Pmin: 1e5, Pmax: 1e7 }
		});
		expect(byWindow.status).toBe(200);
		expect(Math.abs(byWindow.json.state.P - 1e6) / 1e6).toBeLessThan(1e-3);
		const none = await post({
			fluid: 'water',
			inputs: { T: 275, s: ref.s },
			window: { Tmin: 400 }
		});
		expect(none.status).toBe(422);
		expect(none.json.error.code).toBe('outside-window');
	});

	it('refuses unknown fields, malformed near/window and any query parameter with a 400 naming them', async () => {
		const field = await post({ fluid: 'water', inputs: { T: 300, P: 1e5 }, units: 'us' });
		expect(field.status).toBe(400);
		expect(field.json.error.message).toMatch(/"units"/);
		const inNear = await post({
			fluid: 'water',
			inputs: { T: 300, P: 1e5 },
			near: { T: 300, Q: 1 }
		});
		expect(inNear.status).toBe(400);
		expect(inNear.json.error.message).toMatch(/"Q"/);
		const empty = await post({
			fluid: 'water',
			inputs: { T: 300, P: 1e5 },
			window: { Pmin: 2e5, Pmax: 1e5 }
		});
		expect(empty.status).toBe(400);
		const query = await post({ fluid: 'water', inputs: { T: 300, P: 1e5 } }, '?units=us&x=1');
		expect(query.status).toBe(400);
		expect(query.json.error.message).toMatch(/"units", "x"/);
	});

	it('refuses a solid state with solid-region (422)', async () => {
		const r = await post({ fluid: 'water', inputs: { T: 273.16, P: 1e9 } });
		expect(r.status).toBe(422);
		expect(r.json.error.code).toBe('solid-region');
	});
});
