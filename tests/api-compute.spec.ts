import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';
import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import { DEMO, ownPort, signedInRequest } from './helpers';

/*
 * The compute API over real HTTP against the built app (the Playwright config starts it).
 * Values checked against sources outside the project are named beside each check.
 */

const legsFixture = JSON.parse(readFileSync('tests/reference/iapws-legs.json', 'utf8')) as {
	cases: {
		name: string;
		end: { T: number; P: number; rho: number };
		crossings: { line: string; T: number; P: number; rho: number }[];
	}[];
};
const refCase = (name: string) => legsFixture.cases.find((c) => c.name === name)!;
const sealedVessel = JSON.parse(readFileSync('examples/sealed-vessel.json', 'utf8'));
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

const LEG = {
	fluid: 'water',
	start: { T: 300, P: 101325 },
	process: 'isobaric',
	target: { T: 500 }
};
const STATE = { fluid: 'water', inputs: { T: 450, P: 1e6 } };
const PATH = {
	fluid: 'water',
	system: { kind: 'closed', mass: 2 },
	start: { T: 300, P: 1e5 },
	legs: [{ process: 'isobaric', target: { T: 400 } }]
};

interface Row {
	name: string;
	method?: 'GET' | 'POST' | 'PUT' | 'DELETE';
	path: string;
	/** an object is sent as JSON; a string is sent as is */
	body?: unknown;
	type?: string | null;
	status: number;
	code?: string;
	message?: RegExp;
}

async function send(request: APIRequestContext, r: Row) {
	const headers: Record<string, string> = {};
	if (r.type !== null && r.body !== undefined)
		headers['content-type'] = r.type ?? 'application/json';
	const data =
		r.body === undefined
			? undefined
			: Buffer.from(typeof r.body === 'string' ? r.body : JSON.stringify(r.body));
	return request.fetch(r.path, {
		method: r.method ?? (r.body === undefined ? 'GET' : 'POST'),
		headers,
		data
	});
}

const with_ = (base: object, patch: object) => ({ ...base, ...patch });

const BAD: Row[] = [
	// ---- POST /api/v1/states
	{
		name: 'states: missing inputs',
		path: '/api/v1/states',
		body: { fluid: 'water' },
		status: 400,
		code: 'invalid-input',
		message: /inputs is required/
	},
	{
		name: 'states: missing fluid',
		path: '/api/v1/states',
		body: { inputs: { T: 450, P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /fluid is required/
	},
	{
		name: 'states: one input',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450 } },
		status: 400,
		code: 'invalid-input',
		message: /exactly two properties/
	},
	{
		name: 'states: three inputs',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450, P: 1e5, h: 1e6 } },
		status: 400,
		code: 'invalid-input',
		message: /exactly two/
	},
	{
		name: 'states: v and rho',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { v: 1, rho: 1 } },
		status: 400,
		code: 'invalid-input',
		message: /same property/
	},
	{
		name: 'states: string number',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: '450', P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /T must be a number in K/
	},
	{
		name: 'states: null',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: null, P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /got null/
	},
	{
		name: 'states: array value',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: [450], P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /got a list/
	},
	{
		name: 'states: nested junk',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: { K: 450 }, P: { a: [1] } } },
		status: 400,
		code: 'invalid-input',
		message: /got an object/
	},
	{
		name: 'states: NaN literal',
		path: '/api/v1/states',
		body: '{"fluid":"water","inputs":{"T":NaN,"P":1e5}}',
		status: 400,
		code: 'invalid-json',
		message: /no NaN, Infinity/
	},
	{
		name: 'states: Infinity literal',
		path: '/api/v1/states',
		body: '{"fluid":"water","inputs":{"T":Infinity,"P":1e5}}',
		status: 400,
		code: 'invalid-json'
	},
	{
		name: 'states: huge number overflows',
		path: '/api/v1/states',
		body: '{"fluid":"water","inputs":{"T":1e999,"P":1e5}}',
		status: 400,
		code: 'invalid-input',
		message: /T must be a number/
	},
	{
		name: 'states: negative absolute pressure',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450, P: -2e5 } },
		status: 400,
		code: 'invalid-input',
		message: /absolute pressure in Pa \(not gauge\)/
	},
	{
		name: 'states: temperature in °C',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: -10, P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /not °C/
	},
	{
		name: 'states: x > 1',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450, x: 1.5 } },
		status: 400,
		code: 'invalid-input',
		message: /from 0 to 1/
	},
	{
		name: 'states: unknown property',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450, p: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /Unknown field "p"/
	},
	{
		name: 'states: unknown top-level field',
		path: '/api/v1/states',
		body: with_(STATE, { units: 'SI' }),
		status: 400,
		code: 'invalid-input',
		message: /Unknown field "units"/
	},
	{
		name: 'states: unknown fluid',
		path: '/api/v1/states',
		body: { fluid: 'unobtainium', inputs: { T: 450, P: 1e5 } },
		status: 400,
		code: 'unknown-fluid',
		message: /water, ammonia/
	},
	{
		name: 'states: fluid not a string',
		path: '/api/v1/states',
		body: { fluid: 42, inputs: { T: 450, P: 1e5 } },
		status: 400,
		code: 'invalid-input',
		message: /fluid must be a fluid id/
	},
	{
		name: 'states: T and P on the saturation line',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 450, P: 932203.564 } },
		status: 422
	},
	{
		name: 'states: below the triple point',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 200, P: 1e5 } },
		status: 422,
		code: 'below-triple-point'
	},
	{
		name: 'states: above the range',
		path: '/api/v1/states',
		body: { fluid: 'water', inputs: { T: 5000, P: 1e5 } },
		status: 422,
		code: 'out-of-range'
	},
	{
		name: 'states: body is an array',
		path: '/api/v1/states',
		body: [STATE],
		status: 400,
		code: 'invalid-input',
		message: /must be .*object/
	},
	{
		name: 'states: body is a number',
		path: '/api/v1/states',
		body: '42',
		status: 400,
		code: 'invalid-input'
	},
	{
		name: 'states: not JSON',
		path: '/api/v1/states',
		body: 'T=450&P=1e5',
		status: 400,
		code: 'invalid-json',
		message: /not valid JSON/
	},
	{
		name: 'states: empty body',
		path: '/api/v1/states',
		body: '',
		status: 400,
		code: 'invalid-json',
		message: /empty/
	},
	{
		name: 'states: wrong content type',
		path: '/api/v1/states',
		body: JSON.stringify(STATE),
		type: 'application/xml',
		status: 415,
		code: 'unsupported-media-type',
		message: /application\/json/
	},
	{
		name: 'states: no content type',
		path: '/api/v1/states',
		body: JSON.stringify(STATE),
		type: null,
		status: 415,
		code: 'unsupported-media-type'
	},
	{
		name: 'states: GET on a POST route',
		method: 'GET',
		path: '/api/v1/states',
		status: 405,
		code: 'method-not-allowed',
		message: /use POST/
	},
	{
		name: 'states: PUT',
		method: 'PUT',
		path: '/api/v1/states',
		body: STATE,
		status: 405,
		code: 'method-not-allowed'
	},
	// ---- POST /api/v1/legs
	{
		name: 'legs: missing process',
		path: '/api/v1/legs',
		body: { fluid: 'water', start: LEG.start, target: LEG.target },
		status: 400,
		code: 'invalid-input',
		message: /process must be one of/
	},
	{
		name: 'legs: unknown process',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'adiabatic' }),
		status: 400,
		code: 'invalid-input',
		message: /process must be one of isobaric/
	},
	{
		name: 'legs: missing target',
		path: '/api/v1/legs',
		body: { fluid: 'water', start: LEG.start, process: 'isobaric' },
		status: 400,
		code: 'invalid-input',
		message: /target is required/
	},
	{
		name: 'legs: two targets',
		path: '/api/v1/legs',
		body: with_(LEG, { target: { T: 500, h: 3e6 } }),
		status: 400,
		code: 'invalid-input',
		message: /exactly one target property/
	},
	{
		name: 'legs: empty target',
		path: '/api/v1/legs',
		body: with_(LEG, { target: {} }),
		status: 400,
		code: 'invalid-input',
		message: /exactly one target/
	},
	{
		name: 'legs: unknown target property',
		path: '/api/v1/legs',
		body: with_(LEG, { target: { Q: 5 } }),
		status: 400,
		code: 'invalid-input',
		message: /Unknown field "Q"/
	},
	{
		name: 'legs: target equal to the invariant',
		path: '/api/v1/legs',
		body: with_(LEG, { target: { P: 5e5 } }),
		status: 422,
		code: 'target-is-invariant',
		message: /keeps P fixed/
	},
	{
		name: 'legs: isochoric to a v',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'isochoric', target: { v: 0.5 } }),
		status: 422,
		code: 'target-is-invariant'
	},
	{
		name: 'legs: polytropic without n',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'polytropic', target: { P: 1e6 } }),
		status: 400,
		code: 'invalid-input',
		message: /needs n/
	},
	{
		name: 'legs: n as a string',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'polytropic', n: '1.3', target: { P: 1e6 } }),
		status: 400,
		code: 'invalid-input',
		message: /n must be a number/
	},
	{
		name: 'legs: absurd n',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'polytropic', n: 1e9, target: { P: 1e6 } }),
		status: 400,
		code: 'invalid-input',
		message: /n must be from/
	},
	{
		name: 'legs: n on an isobar',
		path: '/api/v1/legs',
		body: with_(LEG, { n: 1.3 }),
		status: 400,
		code: 'invalid-input',
		message: /polytropic legs only/
	},
	{
		name: 'legs: samples too few',
		path: '/api/v1/legs',
		body: with_(LEG, { samples: 2 }),
		status: 400,
		code: 'invalid-input',
		message: /at least 20/
	},
	{
		name: 'legs: absurd samples',
		path: '/api/v1/legs',
		body: with_(LEG, { samples: 1e12 }),
		status: 400,
		code: 'invalid-input',
		message: /at most 1000/
	},
	{
		name: 'legs: fractional samples',
		path: '/api/v1/legs',
		body: with_(LEG, { samples: 33.3 }),
		status: 400,
		code: 'invalid-input',
		message: /whole number/
	},
	{
		name: 'legs: unreachable target',
		path: '/api/v1/legs',
		body: with_(LEG, { target: { T: 150 } }),
		status: 422,
		code: 'unreachable-target',
		message: /reaches T from 273\.16 to 1273 K/
	},
	{
		name: 'legs: x on a supercritical isotherm',
		path: '/api/v1/legs',
		body: { fluid: 'water', start: { T: 700, P: 3e7 }, process: 'isothermal', target: { x: 0.5 } },
		status: 422,
		code: 'unreachable-target',
		message: /never enters the vapor dome/
	},
	{
		name: 'legs: throttling up in pressure',
		path: '/api/v1/legs',
		body: { fluid: 'water', start: { T: 500, P: 1e6 }, process: 'isenthalpic', target: { P: 5e6 } },
		status: 422,
		code: 'unreachable-target',
		message: /only lower the pressure/
	},
	{
		name: 'legs: target x > 1',
		path: '/api/v1/legs',
		body: with_(LEG, { target: { x: 2 } }),
		status: 400,
		code: 'invalid-input',
		message: /from 0 to 1/
	},
	{
		name: 'legs: negative target pressure',
		path: '/api/v1/legs',
		body: with_(LEG, { process: 'isothermal', target: { P: -1 } }),
		status: 400,
		code: 'invalid-input',
		message: /absolute pressure/
	},
	{
		name: 'legs: start a string',
		path: '/api/v1/legs',
		body: with_(LEG, { start: 'room temperature' }),
		status: 400,
		code: 'invalid-input',
		message: /start|inputs/
	},
	{
		name: 'legs: unknown fluid',
		path: '/api/v1/legs',
		body: with_(LEG, { fluid: 'R-22' }),
		status: 400,
		code: 'unknown-fluid'
	},
	{
		name: 'legs: GET',
		method: 'GET',
		path: '/api/v1/legs',
		status: 405,
		code: 'method-not-allowed',
		message: /use POST/
	},
	// ---- POST /api/v1/paths
	{
		name: 'paths: missing system',
		path: '/api/v1/paths',
		body: { fluid: 'water', start: PATH.start, legs: PATH.legs },
		status: 400,
		code: 'invalid-input',
		message: /system must be/
	},
	{
		name: 'paths: mass and volume',
		path: '/api/v1/paths',
		body: with_(PATH, { system: { kind: 'closed', mass: 1, volume: 1 } }),
		status: 400,
		code: 'invalid-input',
		message: /not both/
	},
	{
		name: 'paths: flow without massFlow',
		path: '/api/v1/paths',
		body: with_(PATH, { system: { kind: 'flow' } }),
		status: 400,
		code: 'invalid-input',
		message: /massFlow is required/
	},
	{
		name: 'paths: negative mass',
		path: '/api/v1/paths',
		body: with_(PATH, { system: { kind: 'closed', mass: -3 } }),
		status: 400,
		code: 'invalid-input',
		message: /positive/
	},
	{
		name: 'paths: no legs',
		path: '/api/v1/paths',
		body: with_(PATH, { legs: [] }),
		status: 400,
		code: 'invalid-input',
		message: /at least one leg/
	},
	{
		name: 'paths: legs not a list',
		path: '/api/v1/paths',
		body: with_(PATH, { legs: { process: 'isobaric' } }),
		status: 400,
		code: 'invalid-input',
		message: /legs must be a list/
	},
	{
		name: 'paths: 51 legs',
		path: '/api/v1/paths',
		body: with_(PATH, { legs: new Array(51).fill({ process: 'isobaric', target: { T: 400 } }) }),
		status: 400,
		code: 'invalid-input',
		message: /at most 50 legs/
	},
	{
		name: 'paths: duplicate leg ids',
		path: '/api/v1/paths',
		body: with_(PATH, {
			legs: [
				{ id: 'a', process: 'isobaric', target: { T: 400 } },
				{ id: 'a', process: 'isochoric', target: { T: 450 } }
			]
		}),
		status: 400,
		code: 'invalid-input',
		message: /Two legs/
	},
	{
		name: 'paths: unknown limit',
		path: '/api/v1/paths',
		body: with_(PATH, { limits: { burstPressure: 1e7 } }),
		status: 400,
		code: 'invalid-input',
		message: /Unknown field "burstPressure" in limits/
	},
	{
		name: 'paths: limit as a string',
		path: '/api/v1/paths',
		body: with_(PATH, { limits: { designPressure: '16 bar' } }),
		status: 400,
		code: 'invalid-input',
		message: /designPressure must be a number in Pa/
	},
	{
		name: 'paths: a bad leg deep inside',
		path: '/api/v1/paths',
		body: with_(PATH, {
			legs: [
				{ process: 'isobaric', target: { T: 400 } },
				{ process: 'polytropic', target: { P: 1e6 } }
			]
		}),
		status: 400,
		code: 'invalid-input',
		message: /legs\.1\.n/
	},
	{
		name: 'paths: an unreachable second leg',
		path: '/api/v1/paths',
		body: with_(PATH, {
			legs: [
				{ process: 'isobaric', target: { T: 400 } },
				{ process: 'isobaric', target: { T: 100 } }
			]
		}),
		status: 422,
		code: 'unreachable-target',
		message: /Leg L2/
	},
	{
		name: 'paths: too many points',
		path: '/api/v1/paths',
		body: with_(PATH, {
			samples: 1000,
			legs: new Array(11).fill({ process: 'isobaric', target: { T: 400 } })
		}),
		status: 400,
		code: 'invalid-input',
		message: /11000 points .*at most 4000 per request/
	},
	{
		name: 'paths: GET',
		method: 'GET',
		path: '/api/v1/paths',
		status: 405,
		code: 'method-not-allowed'
	},
	// ---- GET /api/v1/fluids, saturation, isolines
	{
		name: 'fluids: unexpected query',
		path: '/api/v1/fluids?units=US',
		status: 400,
		code: 'invalid-input',
		message: /Unknown field "units"/
	},
	{
		name: 'fluids: POST',
		method: 'POST',
		path: '/api/v1/fluids',
		body: {},
		status: 405,
		code: 'method-not-allowed'
	},
	{
		name: 'saturation: unknown fluid',
		path: '/api/v1/fluids/unobtainium/saturation',
		status: 404,
		code: 'unknown-fluid',
		message: /Use one of: water/
	},
	{
		name: 'saturation: not an id at all',
		path: '/api/v1/fluids/%20%3Cscript%3E/saturation',
		status: 404
	},
	{
		name: 'saturation: points too few',
		path: '/api/v1/fluids/water/saturation?points=1',
		status: 400,
		code: 'invalid-input',
		message: /at least 2/
	},
	{
		name: 'saturation: absurd points',
		path: '/api/v1/fluids/water/saturation?points=99999999',
		status: 400,
		code: 'invalid-input',
		message: /whole number|at most/
	},
	{
		name: 'saturation: points not a number',
		path: '/api/v1/fluids/water/saturation?points=many',
		status: 400,
		code: 'invalid-input',
		message: /whole number/
	},
	{
		name: 'isolines: missing kind',
		path: '/api/v1/fluids/water/isolines?values=1e5',
		status: 400,
		code: 'invalid-input',
		message: /kind must be one of isobar, isotherm, isochore/
	},
	{
		name: 'isolines: unknown kind',
		path: '/api/v1/fluids/water/isolines?kind=isoquant&values=1e5',
		status: 400,
		code: 'invalid-input',
		message: /kind must be one of/
	},
	{
		name: 'isolines: missing values',
		path: '/api/v1/fluids/water/isolines?kind=isobar',
		status: 400,
		code: 'invalid-input',
		message: /values is required/
	},
	{
		name: 'isolines: values not numbers',
		path: '/api/v1/fluids/water/isolines?kind=isobar&values=1bar,2bar',
		status: 400,
		code: 'invalid-input',
		message: /"1bar" is not one/
	},
	{
		name: 'isolines: negative value',
		path: '/api/v1/fluids/water/isolines?kind=isobar&values=-1e5',
		status: 400,
		code: 'invalid-input',
		message: /positive/
	},
	{
		name: 'isolines: too many values',
		path: `/api/v1/fluids/water/isolines?kind=isotherm&values=${new Array(41).fill(400).join(',')}`,
		status: 400,
		code: 'invalid-input',
		message: /At most 40 values/
	},
	{
		name: 'isolines: values × points past the cap',
		path: `/api/v1/fluids/water/isolines?kind=isochore&points=2000&values=${new Array(40).fill(0.01).join(',')}`,
		status: 400,
		code: 'invalid-input',
		message: /at most 4000 per request \(values × points\)/
	},
	{
		name: 'isolines: absurd points',
		path: '/api/v1/fluids/water/isolines?kind=isobar&values=1e5&points=1000000',
		status: 400,
		code: 'invalid-input',
		message: /at most 2000/
	},
	{
		name: 'isolines: too few points',
		path: '/api/v1/fluids/water/isolines?kind=isobar&values=1e5&points=3',
		status: 400,
		code: 'invalid-input',
		message: /at least 20/
	},
	{
		name: 'isolines: repeated parameter',
		path: '/api/v1/fluids/water/isolines?kind=isobar&kind=isotherm&values=1e5',
		status: 400,
		code: 'invalid-input',
		message: /more than once/
	},
	{
		name: 'isolines: isotherm below the triple point',
		path: '/api/v1/fluids/water/isolines?kind=isotherm&values=100',
		status: 422,
		code: 'out-of-range',
		message: /273\.16/
	},
	{
		name: 'isolines: isobar above the range',
		path: '/api/v1/fluids/water/isolines?kind=isobar&values=1e12',
		status: 422,
		code: 'out-of-range'
	},
	{
		// isentropes are a kind now: a value no state on the whole range has is refused as out of range
		name: 'isolines: an isentrope no state reaches',
		path: '/api/v1/fluids/water/isolines?kind=isentrope&values=1e5',
		status: 422,
		code: 'out-of-range'
	},
	{
		name: 'isolines: unknown fluid',
		path: '/api/v1/fluids/helium-3/isolines?kind=isobar&values=1e5',
		status: 404,
		code: 'unknown-fluid'
	}
];

test.describe('compute API: every bad input answers 4xx with a useful message', () => {
	for (const r of BAD) {
		test(r.name, async ({ request }) => {
			const res = await send(request, r);
			expect(res.status(), await res.text()).toBe(r.status);
			const body = await res.json();
			expect(body).toHaveProperty('error');
			expect(typeof body.error.message).toBe('string');
			expect(body.error.message.length).toBeGreaterThan(10);
			if (r.code) expect(body.error.code).toBe(r.code);
			if (r.message) expect(`${body.error.message} ${body.error.hint ?? ''}`).toMatch(r.message);
		});
	}

	test('a 1 MB body answers 413, declared or chunked', async ({ request }) => {
		const big = JSON.stringify({ ...LEG, pad: 'x'.repeat(1024 * 1024) });
		const res = await request.post('/api/v1/legs', {
			headers: { 'content-type': 'application/json' },
			data: Buffer.from(big)
		});
		expect(res.status()).toBe(413);
		const body = await res.json();
		expect(body.error.code).toBe('too-large');
		expect(body.error.message).toMatch(/64 kB/);
		// a 70 kB body, just over the limit
		const over = await request.post('/api/v1/paths', {
			headers: { 'content-type': 'application/json' },
			data: Buffer.from(JSON.stringify({ ...PATH, pad: 'y'.repeat(70 * 1024) }))
		});
		expect(over.status()).toBe(413);
	});

	test('form content types: without a session the route says to send JSON; with a session from another site the cross-site check refuses', async ({
		request
	}) => {
		const res = await request.post('/api/v1/legs', {
			headers: { 'content-type': 'text/plain' },
			data: Buffer.from(JSON.stringify(LEG))
		});
		expect(res.status()).toBe(415);
		expect(((await res.json()) as { error: { code: string } }).error.code).toBe(
			'unsupported-media-type'
		);
		const session = await signedInRequest(DEMO.viewer);
		const forged = await session.post('/api/v1/legs', {
			headers: { 'content-type': 'text/plain', origin: 'http://forged.example' },
			data: Buffer.from(JSON.stringify(LEG))
		});
		expect(forged.status()).toBe(403);
		expect(((await forged.json()) as { error: { code: string } }).error.code).toBe(
			'cross-site-form'
		);
		await session.dispose();
	});
});

test.describe('compute API: good answers', () => {
	test('GET /api/v1/fluids lists every fluid with its group, aliases and critical point, cacheably', async ({
		request
	}) => {
		const res = await request.get('/api/v1/fluids');
		expect(res.status()).toBe(200);
		const { fluids } = await res.json();
		expect(fluids.map((f: { id: string }) => f.id)).toEqual(
			expect.arrayContaining([
				'water',
				'ammonia',
				'carbon-dioxide',
				'r134a',
				'nitrogen',
				'propane',
				'r32',
				'methane'
			])
		);
		const water = fluids.find((f: { id: string }) => f.id === 'water');
		expect(water.critical.T).toBeCloseTo(647.096, 3); // IAPWS R6-95(2018): Tc = 647.096 K
		expect(water.critical.rho).toBeCloseTo(322, 6); // IAPWS R6-95(2018): ρc = 322 kg/m³
		for (const k of [
			'name',
			'formula',
			'aliases',
			'group',
			'formulation',
			'triple',
			'limits',
			'referenceState'
		])
			expect(water).toHaveProperty(k);
		expect(fluids.find((f: { id: string }) => f.id === 'propane').aliases).toContain('r-290');
		const etag = res.headers()['etag'];
		expect(etag).toMatch(/^".+"$/);
		expect(res.headers()['cache-control']).toMatch(/max-age=\d+/);
		const again = await request.get('/api/v1/fluids', { headers: { 'if-none-match': etag } });
		expect(again.status()).toBe(304);
	});

	test('POST /api/v1/states fixes a state and adds the practitioner extras', async ({
		request
	}) => {
		const res = await request.post('/api/v1/states', {
			data: { fluid: 'water', inputs: { T: 500, rho: 838.025 } }
		});
		expect(res.status()).toBe(200);
		const { state, extras } = await res.json();
		expect(rel(state.P, 0.100003858e2 * 1e6)).toBeLessThan(1e-8); // IAPWS R6-95(2018), Table 7: T = 500 K, ρ = 838.025 kg/m³
		expect(rel(state.s, 0.256690919e1 * 1e3)).toBeLessThan(1e-8); // IAPWS R6-95(2018), Table 7
		expect(state.phase).toBe('compressed-liquid');
		expect(extras.subcooling).toBeGreaterThan(0);
		const wet = await (
			await request.post('/api/v1/states', { data: { fluid: 'water', inputs: { T: 450, x: 0.5 } } })
		).json();
		expect(wet.state.x).toBe(0.5);
		expect(rel(wet.state.P, 932203.564)).toBeLessThan(1e-6); // IAPWS R6-95(2018), Table 8: p_s(450 K) = 0.932203564 MPa
		expect(wet.extras.vaporVolumeFraction).toBeGreaterThan(0.99);
	});

	test('POST /api/v1/legs: the nearly liquid-full vessel crosses the saturated-liquid line where python3-iapws says', async ({
		request
	}) => {
		const ref = refCase('isochoric to liquid-full'); // python3-iapws 1.5.2 (Debian), IAPWS95, direct (T, x) and (T, rho) calls
		const res = await request.post('/api/v1/legs', {
			data: {
				fluid: 'water',
				start: { T: 393.15, x: 1e-4 },
				process: 'isochoric',
				target: { T: 493.15 },
				samples: 60
			}
		});
		expect(res.status()).toBe(200);
		const { leg } = await res.json();
		expect(leg.points.length).toBeGreaterThanOrEqual(60);
		expect(leg.crossings).toHaveLength(1);
		expect(leg.crossings[0].line).toBe('saturated-liquid');
		expect(rel(leg.crossings[0].state.T, ref.crossings[0].T)).toBeLessThan(1e-8);
		expect(rel(leg.end.P, ref.end.P)).toBeLessThan(1e-7);
		expect(leg.w).toBe(0);
		for (const k of ['q', 'du', 'dh', 'ds', 'wShaft', 'qFlow'])
			expect(Number.isFinite(leg[k])).toBe(true);
	});

	test('POST /api/v1/legs: every process answers, with the compute contract’s fields', async ({
		request
	}) => {
		for (const [process, target, n] of [
			['isobaric', { T: 600 }],
			['isochoric', { T: 600 }],
			['isothermal', { P: 2e4 }],
			['isentropic', { P: 2e4 }],
			['isenthalpic', { P: 2e4 }],
			['polytropic', { P: 2e4 }, 1.2]
		] as const) {
			const res = await request.post('/api/v1/legs', {
				data: { fluid: 'water', start: { T: 500, P: 1e5 }, process, target, ...(n ? { n } : {}) }
			});
			expect(res.status(), process).toBe(200);
			const { leg } = await res.json();
			expect(Object.keys(leg)).toEqual(
				expect.arrayContaining([
					'process',
					'start',
					'end',
					'points',
					'crossings',
					'w',
					'q',
					'du',
					'dh',
					'ds',
					'wShaft',
					'qFlow'
				])
			);
			expect(leg.points.length).toBeGreaterThanOrEqual(40);
			if (process === 'isenthalpic') expect(leg.notes.join(' ')).toMatch(/irreversible/);
		}
	});

	test('GET saturation and isolines draw the dome and lines through it', async ({ request }) => {
		const sat = await request.get('/api/v1/fluids/water/saturation?points=30');
		expect(sat.status()).toBe(200);
		const dome = await sat.json();
		expect(dome.liquid).toHaveLength(30);
		expect(dome.vapor).toHaveLength(30);
		expect(rel(dome.liquid[0].P, 611.654771)).toBeLessThan(1e-6); // IAPWS R6-95(2018): triple-point pressure from the equation
		expect(dome.critical.T).toBeCloseTo(647.096, 3);
		expect(sat.headers()['etag']).toBeTruthy();
		const iso = await request.get(
			'/api/v1/fluids/water/isolines?kind=isobar&values=101325,3e7&points=50'
		);
		expect(iso.status()).toBe(200);
		const { lines, unit } = await iso.json();
		expect(unit).toBe('Pa');
		expect(lines).toHaveLength(2);
		// python3-iapws 1.5.2 (Debian), IAPWS95: Tsat(101325 Pa) by bisection of (T, x = 0) calls
		const Ts = refCase('isobaric liquid to vapor').crossings[0].T;
		const flat = lines[0].points.filter((p: { T: number }) => Math.abs(p.T - Ts) < 1e-6);
		expect(flat.length).toBeGreaterThan(3);
		expect(lines[1].points.every((p: { P: number }) => p.P === 3e7)).toBe(true);
		const aliases = await request.get('/api/v1/fluids/steam/isolines?kind=isotherm&values=450');
		expect(aliases.status()).toBe(200);
	});

	test('POST /api/v1/paths: the sealed-vessel example returns its crossing and the liquid-full warning', async ({
		request
	}) => {
		const res = await request.post('/api/v1/paths', { data: sealedVessel });
		expect(res.status()).toBe(200);
		const { path } = await res.json();
		const ref = refCase('isochoric to liquid-full'); // python3-iapws 1.5.2 (Debian), IAPWS95
		expect(path.states.map((s: { id: string }) => s.id)).toEqual(['S1', 'S2']);
		expect(path.legs[0].leg.crossings[0].line).toBe('saturated-liquid');
		expect(rel(path.legs[0].leg.crossings[0].state.T, ref.crossings[0].T)).toBeLessThan(1e-8);
		const codes = path.warnings.map((w: { code: string }) => w.code);
		expect(codes).toEqual(
			expect.arrayContaining([
				'liquid-full',
				'pressure-equipment-caution',
				'design-pressure-exceeded',
				'relief-set-pressure-exceeded'
			])
		);
		const full = path.warnings.find((w: { code: string }) => w.code === 'liquid-full');
		expect(rel(full.at.T, ref.crossings[0].T)).toBeLessThan(1e-8);
		expect(full.message).toMatch(/pressure very fast/);
		expect(
			path.warnings.find((w: { code: string }) => w.code === 'pressure-equipment-caution').message
		).toMatch(/ASME BPVC Section VIII or EN 13445/);
		expect(path.system.mass).toBeGreaterThan(400);
		expect(path.legs[0].totals.unit).toBe('J');
		const ev = path.limitEvents.find((e: { limit: string }) => e.limit === 'designPressure');
		expect(rel(ev.state.P, 1.6e6)).toBeLessThan(1e-8);
	});
});

test.describe('compute API: rate limit', () => {
	// a second copy of the built app with COMPUTE_RATE_LIMIT=1 (bursts of 2), on its own database
	const PORT = ownPort(900);
	let child: ChildProcess;
	let api: APIRequestContext;
	test.beforeAll(async () => {
		const dir = `tmp/e2e-compute-${PORT}`;
		rmSync(dir, { recursive: true, force: true });
		mkdirSync(dir, { recursive: true });
		child = spawn(process.execPath, ['build/index.js'], {
			stdio: 'ignore',
			env: {
				...process.env,
				NODE_ENV: 'test',
				PORT: String(PORT),
				HOST: '127.0.0.1',
				ORIGIN: `http://127.0.0.1:${PORT}`,
				DATABASE_PATH: `${dir}/statewright.db`,
				SEED_DEMO: '0',
				COMPUTE_RATE_LIMIT: '1'
			}
		});
		api = await playwrightRequest.newContext({ baseURL: `http://127.0.0.1:${PORT}` });
		await expect
			.poll(async () => (await api.get('/healthz').catch(() => null))?.status(), {
				timeout: 30_000
			})
			.toBe(200);
	});
	test.afterAll(async () => {
		await api?.dispose();
		if (child && child.exitCode === null)
			await new Promise((r) => child.once('exit', r).kill('SIGTERM'));
		rmSync(`tmp/e2e-compute-${PORT}`, { recursive: true, force: true });
	});
	test('answers 429 with Retry-After once the bucket is empty', async () => {
		const codes: number[] = [];
		let limited = null;
		for (let i = 0; i < 4; i++) {
			const res = await api.post('/api/v1/states', { data: STATE });
			codes.push(res.status());
			if (res.status() === 429) limited = res;
		}
		expect(codes.slice(0, 2)).toEqual([200, 200]);
		expect(codes).toContain(429);
		expect(Number(limited!.headers()['retry-after'])).toBeGreaterThanOrEqual(1);
		const body = await limited!.json();
		expect(body.error.code).toBe('rate-limited');
		expect(body.error.message).toMatch(/Retry after \d+ s/);
		// once the bucket has refilled it answers again: asked every 100 ms (a refusal takes no
		// token), it must answer 200 within the Retry-After it gave, plus slack for a loaded machine
		await expect
			.poll(async () => (await api.post('/api/v1/states', { data: STATE })).status(), {
				intervals: [100],
				timeout: Number(limited!.headers()['retry-after']) * 1000 + 2000
			})
			.toBe(200);
	});
});
