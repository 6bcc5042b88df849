import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import {
	isolineQuerySchema,
	legRequestSchema,
	noQuerySchema,
	pathRequestSchema,
	saturationQuerySchema,
	stateRequestSchema
} from './schemas';
import { MAX_BODY_BYTES, readBody, readQuery, thermoStatus } from './http';
import { AppError } from '../errors';

const LEG = {
	fluid: 'water',
	start: { T: 300, P: 101325 },
	process: 'isobaric',
	target: { T: 500 }
};
const PATH = {
	fluid: 'water',
	system: { kind: 'closed', volume: 0.5 },
	start: { T: 393.15, x: 1e-4 },
	legs: [{ process: 'isochoric', target: { T: 493.15 } }]
};

function issues(
	schema: { safeParse: (v: unknown) => { success: boolean; error?: ZodError } },
	value: unknown
): string {
	const r = schema.safeParse(value);
	expect(r.success).toBe(false);
	return (r.error as ZodError).issues.map((i) => `${i.path.join('.')}: ${i.message}`).join(' | ');
}

describe('compute request schemas', () => {
	it('accept good requests', () => {
		expect(
			stateRequestSchema.safeParse({ fluid: 'water', inputs: { T: 450, P: 1e6 } }).success
		).toBe(true);
		expect(
			stateRequestSchema.safeParse({
				fluid: 'water',
				inputs: { P: 1e5, x: 0 },
				hint: 'liquid-side'
			}).success
		).toBe(true);
		expect(legRequestSchema.safeParse(LEG).success).toBe(true);
		expect(
			legRequestSchema.safeParse({
				...LEG,
				process: 'polytropic',
				n: 1.3,
				target: { P: 1e6 },
				samples: 200
			}).success
		).toBe(true);
		expect(pathRequestSchema.safeParse(PATH).success).toBe(true);
		expect(
			pathRequestSchema.safeParse({
				...PATH,
				system: { kind: 'flow', massFlow: 2 },
				limits: { designPressure: 1e6 },
				atmosphericPressure: 95000
			}).success
		).toBe(true);
	});

	it('formulation: "if97" for water, refused naming formulation for another fluid or an unknown one', () => {
		expect(pathRequestSchema.safeParse({ ...PATH, formulation: 'if97' }).success).toBe(true);
		expect(pathRequestSchema.safeParse({ ...PATH, formulation: 'iapws95' }).success).toBe(true);
		expect(
			issues(pathRequestSchema, {
				...PATH,
				fluid: 'nitrogen',
				start: { T: 300, P: 1e6 },
				formulation: 'if97'
			})
		).toMatch(/formulation.*water only/);
		expect(issues(pathRequestSchema, { ...PATH, formulation: 'if2000' })).toMatch(
			/formulation must be "iapws95".*"if97"/
		);
	});

	it.each([
		['missing inputs', stateRequestSchema, { fluid: 'water' }, /inputs is required/],
		[
			'one input',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450 } },
			/exactly two properties/
		],
		[
			'three inputs',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450, P: 1e5, x: 0.1 } },
			/exactly two properties/
		],
		[
			'v with rho',
			stateRequestSchema,
			{ fluid: 'water', inputs: { v: 1, rho: 1 } },
			/same property/
		],
		[
			'a string number',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: '450', P: 1e5 } },
			/T must be a number in K; got the text "450"/
		],
		[
			'null',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: null, P: 1e5 } },
			/T must be a number in K; got null/
		],
		[
			'an array',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: [450], P: 1e5 } },
			/got a list/
		],
		[
			'nested junk',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: { value: 450 }, P: 1e5 } },
			/got an object/
		],
		[
			'negative absolute pressure',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450, P: -1e5 } },
			/absolute pressure in Pa \(not gauge\)/
		],
		[
			'zero temperature',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 0, P: 1e5 } },
			/not °C/
		],
		[
			'x above 1',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450, x: 1.2 } },
			/from 0 to 1/
		],
		[
			'unknown input',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450, p: 1e5 } },
			/Unknown field "p" in inputs; allowed: T, P, v, rho, u, h, s, x/
		],
		[
			'unknown hint',
			stateRequestSchema,
			{ fluid: 'water', inputs: { T: 450, P: 1e5 }, hint: 'warmer' },
			/hint must be one of/
		],
		[
			'fluid a number',
			stateRequestSchema,
			{ fluid: 7, inputs: { T: 450, P: 1e5 } },
			/fluid must be a fluid id/
		],
		[
			'empty fluid',
			stateRequestSchema,
			{ fluid: '  ', inputs: { T: 450, P: 1e5 } },
			/must not be empty/
		],
		['body an array', stateRequestSchema, [1, 2], /must be an object/],
		[
			'unknown process',
			legRequestSchema,
			{ ...LEG, process: 'adiabatic' },
			/process must be one of isobaric/
		],
		[
			'two targets',
			legRequestSchema,
			{ ...LEG, target: { T: 500, P: 1e6 } },
			/exactly one target property .*; got T and P/
		],
		['no target', legRequestSchema, { ...LEG, target: {} }, /exactly one target/],
		['target a number', legRequestSchema, { ...LEG, target: 500 }, /target must be an object/],
		[
			'polytropic without n',
			legRequestSchema,
			{ ...LEG, process: 'polytropic', target: { P: 1e6 } },
			/needs n/
		],
		['n on an isobar', legRequestSchema, { ...LEG, n: 1.2 }, /polytropic legs only/],
		[
			'absurd n',
			legRequestSchema,
			{ ...LEG, process: 'polytropic', n: 1e6, target: { P: 1e6 } },
			/n must be from/
		],
		['samples too few', legRequestSchema, { ...LEG, samples: 3 }, /at least 20/],
		['samples absurd', legRequestSchema, { ...LEG, samples: 1e9 }, /at most 1000/],
		['samples fractional', legRequestSchema, { ...LEG, samples: 40.5 }, /whole number/],
		[
			'extra field',
			legRequestSchema,
			{ ...LEG, temperature: 3 },
			/Unknown field "temperature" in the body; allowed: fluid, start/
		],
		[
			'mass and volume',
			pathRequestSchema,
			{ ...PATH, system: { kind: 'closed', mass: 1, volume: 1 } },
			/not both/
		],
		['bad system kind', pathRequestSchema, { ...PATH, system: { kind: 'open' } }, /system must be/],
		[
			'flow without massFlow',
			pathRequestSchema,
			{ ...PATH, system: { kind: 'flow' } },
			/massFlow is required/
		],
		['no legs', pathRequestSchema, { ...PATH, legs: [] }, /at least one leg/],
		[
			'too many legs',
			pathRequestSchema,
			{ ...PATH, legs: new Array(51).fill({ process: 'isobaric', target: { T: 400 } }) },
			/at most 50 legs/
		],
		[
			'too many points',
			pathRequestSchema,
			{
				...PATH,
				samples: 1000,
				legs: new Array(11).fill({ process: 'isobaric', target: { T: 400 } })
			},
			/11000 points .*at most 4000 per request \(legs × points\).*at most 363 each/
		],
		[
			'50 legs of 200 points',
			pathRequestSchema,
			{
				...PATH,
				samples: 200,
				legs: new Array(50).fill({ process: 'isobaric', target: { T: 400 } })
			},
			/10000 points .*at most 4000.*at most 80 each/
		],
		[
			'duplicate leg ids',
			pathRequestSchema,
			{
				...PATH,
				legs: [
					{ id: 'a', process: 'isobaric', target: { T: 400 } },
					{ id: 'a', process: 'isobaric', target: { T: 450 } }
				]
			},
			/Two legs have the id "a"/
		],
		['negative limit', pathRequestSchema, { ...PATH, limits: { designPressure: -1 } }, /positive/],
		[
			'unknown limit',
			pathRequestSchema,
			{ ...PATH, limits: { burstPressure: 1 } },
			/Unknown field "burstPressure" in limits/
		]
	])('refuse %s with a message saying what to give', (_name, schema, value, message) => {
		expect(issues(schema as never, value)).toMatch(message);
	});

	it('read isoline and saturation queries', () => {
		expect(isolineQuerySchema.parse({ kind: 'isobar', values: '1e5, 1e6,2.5E7' })).toEqual({
			kind: 'isobar',
			values: [1e5, 1e6, 2.5e7],
			points: 100
		});
		expect(
			isolineQuerySchema.parse({ kind: 'isochore', values: '.001', points: '40' }).points
		).toBe(40);
		expect(issues(isolineQuerySchema, { kind: 'isoline', values: '1' })).toMatch(
			/kind must be one of isobar, isotherm, isochore, isentrope, isenthalp, quality/
		);
		// s and h count from a reference state: either sign; a quality lies from 0 to 1
		expect(isolineQuerySchema.parse({ kind: 'isentrope', values: '-120,6500' }).values).toEqual([
			-120, 6500
		]);
		expect(issues(isolineQuerySchema, { kind: 'quality', values: '0.5,1.5' })).toMatch(
			/x lies from 0 to 1; got 1.5/
		);
		expect(issues(isolineQuerySchema, { kind: 'isochore', values: '0' })).toMatch(/positive/);
		// an isenthalp point weighs four: 2 lines × 500 points fit, 3 × 400 do not
		expect(
			isolineQuerySchema.parse({ kind: 'isenthalp', values: '1,2', points: '500' }).points
		).toBe(500);
		expect(
			issues(isolineQuerySchema, { kind: 'isenthalp', values: '1,2,3', points: '400' })
		).toMatch(/3 lines × 400 points × 4 \(an isenthalp point costs 4\) = 4800 points.*points=333/);
		expect(issues(isolineQuerySchema, { kind: 'isobar' })).toMatch(/values is required/);
		expect(issues(isolineQuerySchema, { kind: 'isobar', values: '1e5,NaN' })).toMatch(
			/"NaN" is not one/
		);
		expect(issues(isolineQuerySchema, { kind: 'isobar', values: '1e5,-3' })).toMatch(/positive/);
		expect(
			issues(isolineQuerySchema, { kind: 'isobar', values: new Array(41).fill('1e5').join(',') })
		).toMatch(/At most 40 values/);
		expect(issues(isolineQuerySchema, { kind: 'isobar', values: '1e5', points: '999999' })).toMatch(
			/at most 2000/
		);
		// values × points: 40 × 2000 asked for 80 000 points
		expect(
			issues(isolineQuerySchema, {
				kind: 'isochore',
				values: new Array(40).fill('0.01').join(','),
				points: '2000'
			})
		).toMatch(/40 lines × 2000 points = 80000 points; at most 4000 .*points=100 or less/);
		expect(
			isolineQuerySchema.parse({ kind: 'isobar', values: new Array(40).fill('1e5').join(',') })
				.points
		).toBe(100);
		expect(
			isolineQuerySchema.parse({ kind: 'isobar', values: '1e5,2e5', points: '2000' }).points
		).toBe(2000);
		expect(issues(isolineQuerySchema, { kind: 'isobar', values: '1e5', points: 'lots' })).toMatch(
			/whole number/
		);
		expect(issues(isolineQuerySchema, { kind: 'isobar', values: '1e5', colour: 'red' })).toMatch(
			/colour/
		);
		expect(saturationQuerySchema.parse({ points: '50' })).toEqual({ points: 50 });
		expect(issues(saturationQuerySchema, { points: '1' })).toMatch(/at least 2/);
	});
});

describe('compute body and query reading', () => {
	const post = (
		body: BodyInit | null,
		type: string | null = 'application/json',
		headers: Record<string, string> = {}
	) =>
		new Request('http://x/api/v1/legs', {
			method: 'POST',
			body,
			headers: { ...(type ? { 'content-type': type } : {}), ...headers }
		});
	async function fails(r: Request): Promise<AppError> {
		try {
			await readBody(r, legRequestSchema);
		} catch (e) {
			if (e instanceof AppError) return e;
			throw e;
		}
		throw new Error('expected an AppError');
	}
	it('reads a JSON body', async () => {
		expect(await readBody(post(JSON.stringify(LEG)), legRequestSchema)).toMatchObject({
			process: 'isobaric'
		});
		expect(
			await readBody(post(JSON.stringify(LEG), 'application/json; charset=utf-8'), legRequestSchema)
		).toMatchObject({ fluid: 'water' });
	});
	it('refuses the wrong content type (415), a body over 64 kB (413), non-JSON and empty bodies (400)', async () => {
		expect((await fails(post(JSON.stringify(LEG), 'text/csv'))).status).toBe(415);
		expect((await fails(post(JSON.stringify(LEG), null))).status).toBe(415);
		expect((await fails(post('x'.repeat(MAX_BODY_BYTES + 1)))).status).toBe(413);
		const big = new Request('http://x/', {
			method: 'POST',
			body: new ReadableStream({
				start(c) {
					for (let i = 0; i < 20; i++) c.enqueue(new Uint8Array(8192));
					c.close();
				}
			}),
			headers: { 'content-type': 'application/json' },
			duplex: 'half'
		} as RequestInit);
		expect((await fails(big)).status).toBe(413);
		const bad = await fails(post('{"fluid": "water",'));
		expect([bad.status, bad.code]).toEqual([400, 'invalid-json']);
		expect(bad.message).toMatch(/not valid JSON/);
		expect((await fails(post('{"T": NaN}'))).message).toMatch(/no NaN, Infinity/);
		expect((await fails(post(''))).message).toMatch(/empty/);
	});
	it('refuses a repeated query parameter', () => {
		expect(() =>
			readQuery(new URL('http://x/?kind=isobar&kind=isotherm&values=1'), isolineQuerySchema)
		).toThrow(/more than once/);
	});
	it('maps engine codes: malformed input 400, unanswerable 422', () => {
		expect(thermoStatus('wrong-input-count')).toBe(400);
		expect(thermoStatus('invalid-leg')).toBe(400);
		expect(thermoStatus('unknown-fluid')).toBe(400);
		expect(thermoStatus('unreachable-target')).toBe(422);
		expect(thermoStatus('target-is-invariant')).toBe(422);
		expect(thermoStatus('two-phase-pressure-temperature')).toBe(422);
		expect(thermoStatus('no-convergence')).toBe(422);
	});
});

describe('query parameters are never ignored', () => {
	it('a route without parameters refuses any, by name', () => {
		let message = '';
		try {
			readQuery(new URL('http://127.0.0.1/api/v1/fluids?units=us'), noQuerySchema);
		} catch (e) {
			message = (e as ZodError).issues.map((i) => i.message).join(' ');
		}
		expect(message).toMatch(/"units"/);
		expect(readQuery(new URL('http://127.0.0.1/api/v1/fluids'), noQuerySchema)).toEqual({});
	});
});
