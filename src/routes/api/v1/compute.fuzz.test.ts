import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { answerCache, resetComputeLimiter } from '$lib/server/compute/http';
import { callRoute } from '$lib/server/compute/testing';
import { GET as fluidsList } from './fluids/+server';
import { GET as isolines } from './fluids/[id=fluid]/isolines/+server';
import { GET as saturation } from './fluids/[id=fluid]/saturation/+server';
import { POST as states } from './states/+server';
import { POST as legs } from './legs/+server';
import { POST as paths } from './paths/+server';

/*
 * Seeded fuzz of every compute route, through the real handlers: junk and near-valid bodies and
 * queries. Whatever is sent, the answer is never a 5xx; a refusal has the JSON error shape
 * { error: { code, message } }; an answer carries no NaN or Infinity (JSON turns them into null, so
 * every state's T, P, v, rho, u, h, s must be finite numbers, and x, cp, cv, w finite or null).
 * The seed is fixed, so a failure repeats; the run counts keep the file well under a minute.
 */
const SEED = 20261202;
const saved = process.env.COMPUTE_RATE_LIMIT;
beforeAll(() => {
	process.env.COMPUTE_RATE_LIMIT = '0';
	resetComputeLimiter();
});
afterAll(() => {
	if (saved === undefined) delete process.env.COMPUTE_RATE_LIMIT;
	else process.env.COMPUTE_RATE_LIMIT = saved;
	resetComputeLimiter();
	answerCache.clear();
});

const FLUIDS = [
	'water',
	'ammonia',
	'carbon-dioxide',
	'r134a',
	'nitrogen',
	'steam',
	'CO2',
	'r-134a',
	'argon',
	'propane',
	'helium-3',
	'',
	' water '
];
const PROPS = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'] as const;
const PROCESSES = [
	'isobaric',
	'isochoric',
	'isothermal',
	'isentropic',
	'isenthalpic',
	'polytropic'
];
const EXTREMES = [
	0,
	-0,
	-1,
	1,
	1e-300,
	5e-324,
	1e300,
	Number.MAX_VALUE,
	-Number.MAX_VALUE,
	0.5,
	1 - 1e-12,
	1 + 1e-12
];

/** A uniform fraction 0…1 (fast-check's doubles lean toward 0 and the extremes; these values should not). */
const fraction = fc.integer({ min: 0, max: 1_000_000 }).map((i) => i / 1_000_000);

/** A value for one property: mostly in its physical range (log-spread where positive), sometimes absurd. */
function value(p: string): fc.Arbitrary<number> {
	const range: Record<string, [number, number]> = {
		T: [50, 2500],
		P: [1, 2e9],
		v: [2e-4, 1e4],
		rho: [1e-4, 1500],
		u: [-5e5, 4e6],
		h: [-5e5, 4e6],
		s: [-2e3, 1.2e4],
		x: [0, 1]
	};
	const [lo, hi] = range[p] ?? [-1e6, 1e6];
	const inRange = fraction.map((f) => (lo > 0 ? lo * (hi / lo) ** f : lo + (hi - lo) * f));
	return fc.oneof(
		{ weight: 25, arbitrary: inRange },
		{ weight: 1, arbitrary: fc.constantFrom(...EXTREMES) },
		{ weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) }
	);
}

/** Pairs that fix a state of every fluid somewhere in its range: the engine answers most of them. */
const likely: fc.Arbitrary<Record<string, number>> = fc.oneof(
	fc.record({ T: fraction.map((f) => 200 + 500 * f), P: fraction.map((f) => 1e3 * 1e4 ** f) }),
	fc.record({ T: fraction.map((f) => 200 + 150 * f), x: fraction }),
	fc.record({ P: fraction.map((f) => 2e4 * 100 ** f), x: fraction }),
	fc.record({ T: fraction.map((f) => 250 + 400 * f), v: fraction.map((f) => 1e-3 * 1e5 ** f) })
);

/** Inputs: usually two properties, sometimes one, three, or a wrong type. */
const inputs: fc.Arbitrary<unknown> = fc.oneof(
	{ weight: 20, arbitrary: likely },
	{
		weight: 20,
		arbitrary: fc
			.uniqueArray(fc.constantFrom(...PROPS), { minLength: 2, maxLength: 2 })
			.chain((keys) =>
				fc.tuple(...keys.map(value)).map((vs) => Object.fromEntries(keys.map((k, i) => [k, vs[i]])))
			)
	},
	{
		weight: 1,
		arbitrary: fc
			.uniqueArray(fc.constantFrom(...PROPS, 'temp', 'Pa'), { minLength: 0, maxLength: 3 })
			.chain((keys) =>
				fc.tuple(...keys.map(value)).map((vs) => Object.fromEntries(keys.map((k, i) => [k, vs[i]])))
			)
	},
	{ weight: 1, arbitrary: fc.anything() }
);

const target: fc.Arbitrary<unknown> = fc.oneof(
	{
		weight: 20,
		arbitrary: fc.constantFrom(...PROPS).chain((k) => value(k).map((v) => ({ [k]: v })))
	},
	{ weight: 1, arbitrary: fc.anything() }
);

/** Sometimes absent (1 in `freq`). */
const maybe = <T>(a: fc.Arbitrary<T>, freq = 3) => fc.option(a, { nil: undefined, freq });
const samples = fc.oneof(
	{ weight: 8, arbitrary: fc.integer({ min: 20, max: 80 }) },
	{ weight: 1, arbitrary: fc.constantFrom(0, 19, 1000, 1001, 33.5, -40) }
);
const nExp = fc.oneof(
	{ weight: 8, arbitrary: fc.double({ min: -3, max: 3, noNaN: true }) },
	{ weight: 1, arbitrary: fc.constantFrom(0, 1, -1, 50, 51) }
);

/** A process, with n when it is polytropic (now and then n where it does not belong, or missing). */
const processAndN = fc
	.tuple(
		fc.oneof(
			{ weight: 20, arbitrary: fc.constantFrom(...PROCESSES) },
			{ weight: 1, arbitrary: fc.string() }
		),
		nExp,
		fc.integer({ min: 0, max: 19 })
	)
	.map(([process, n, dice]) =>
		(process === 'polytropic') !== (dice === 0) ? { process, n } : { process }
	);

const legSpec = fc
	.tuple(
		processAndN,
		fc.record(
			{ target, samples: maybe(samples, 5), id: maybe(fc.string({ maxLength: 45 }), 8) },
			{ requiredKeys: ['target'] }
		)
	)
	.map(([pn, rest]) => ({ ...pn, ...rest }));

/** A leg the engine can usually draw from a likely start: a temperature or pressure target that suits the process. */
const likelyLeg = fc
	.tuple(fc.constantFrom(...PROCESSES), fraction, fraction)
	.map(([process, f, g]) =>
		process === 'isobaric' || process === 'isochoric'
			? { process, target: { T: 220 + 480 * f } }
			: process === 'polytropic'
				? { process, n: 1 + 0.4 * g, target: { P: 1e4 * 1e3 ** f } }
				: { process, target: { P: 1e4 * 1e3 ** f } }
	);

const system = fc.oneof(
	{ weight: 3, arbitrary: fc.constant({ kind: 'closed', mass: 1 }) },
	{ weight: 3, arbitrary: fc.constant({ kind: 'closed', volume: 0.5 }) },
	{ weight: 3, arbitrary: fc.constant({ kind: 'flow', massFlow: 2 }) },
	{
		weight: 1,
		arbitrary: fc.record({
			kind: fc.constantFrom('closed', 'flow', 'open'),
			mass: maybe(value('v')),
			volume: maybe(value('v')),
			massFlow: maybe(fc.double({ noNaN: true }))
		})
	}
);

const drop = (o: Record<string, unknown>) =>
	Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));
const fluid = fc.oneof(
	{
		weight: 15,
		arbitrary: fc.constantFrom('water', 'ammonia', 'carbon-dioxide', 'r134a', 'nitrogen')
	},
	{ weight: 3, arbitrary: fc.constantFrom(...FLUIDS) },
	{ weight: 1, arbitrary: fc.anything() }
);

const stateBody = fc
	.record({
		fluid,
		inputs,
		hint: maybe(fc.constantFrom('lower-T', 'higher-T', 'liquid-side', 'vapor-side', 'sideways'), 10)
	})
	.map(drop);
const legBody = fc
	.tuple(processAndN, fc.record({ fluid, start: inputs, target, samples: maybe(samples, 5) }))
	.map(([pn, rest]) => drop({ ...rest, ...pn }));
const pathBody = fc
	.record({
		fluid,
		system,
		start: inputs,
		legs: fc
			.oneof(
				{ weight: 10, arbitrary: fc.array(likelyLeg, { minLength: 1, maxLength: 4 }) },
				{
					weight: 10,
					arbitrary: fc.array(fc.oneof(likelyLeg, legSpec), { minLength: 1, maxLength: 4 })
				},
				{ weight: 1, arbitrary: fc.constant([]) }
			)
			.map((ls) => ls.map((l) => drop(l as Record<string, unknown>))),
		limits: maybe(
			fc
				.record({
					designPressure: maybe(value('P')),
					designTemperature: maybe(value('T')),
					reliefSetPressure: maybe(value('P'))
				})
				.map(drop)
		),
		atmosphericPressure: maybe(value('P'), 8),
		samples: maybe(samples, 5)
	})
	.map(drop);

/** Text a client might send instead of a JSON object: broken JSON, NaN and Infinity spelled out, arrays. */
const junkText = fc.oneof(
	fc.string(),
	fc.json(),
	fc.constantFrom(
		'',
		' ',
		'{',
		'[]',
		'null',
		'{"fluid":"water","inputs":{"T":NaN,"P":1e5}}',
		'{"fluid":"water","inputs":{"T":1e999,"P":1e5}}',
		'{"fluid":"water","inputs":{"T":"450 K","P":1e5}}'
	)
);

/** A body: mostly near-valid, sometimes junk text, sometimes sent with the wrong content type. */
function body(near: fc.Arbitrary<unknown>): fc.Arbitrary<{ text: string; type: string }> {
	return fc
		.tuple(
			fc.oneof(
				{ weight: 12, arbitrary: near.map((b) => JSON.stringify(b) ?? 'null') },
				{ weight: 1, arbitrary: junkText }
			),
			fc.oneof(
				{
					weight: 12,
					arbitrary: fc.constantFrom('application/json', 'application/json; charset=utf-8')
				},
				{
					weight: 1,
					arbitrary: fc.constantFrom('text/plain', '', 'application/x-www-form-urlencoded')
				}
			)
		)
		.map(([text, type]) => ({ text, type }));
}

const STATE_FIELDS = ['T', 'P', 'v', 'rho', 'u', 'h', 's'];
const NULLABLE_FIELDS = ['x', 'cp', 'cv', 'w'];

/** Every state-like object (has a phase and T) and every isoline point carries finite numbers. */
function checkNumbers(node: unknown, where = '$'): void {
	if (Array.isArray(node)) return node.forEach((n, i) => checkNumbers(n, `${where}[${i}]`));
	if (!node || typeof node !== 'object') {
		if (typeof node === 'number')
			expect(Number.isFinite(node), `${where} is not finite`).toBe(true);
		return;
	}
	const o = node as Record<string, unknown>;
	if (typeof o.phase === 'string' && 'T' in o) {
		for (const k of STATE_FIELDS)
			expect(
				Number.isFinite(o[k]),
				`${where}.${k} = ${String(o[k])} (a NaN or Infinity turned null?)`
			).toBe(true);
		for (const k of NULLABLE_FIELDS)
			if (k in o) expect(o[k] === null || Number.isFinite(o[k]), `${where}.${k}`).toBe(true);
	}
	for (const [k, v] of Object.entries(o)) checkNumbers(v, `${where}.${k}`);
}

/** Answers seen per route and status, to show the fuzz reaches the engine and not only the schemas. */
const seen = new Map<string, number>();
const tally = (what: string, status: number) => {
	const key = `${what
		.split(' ')
		.slice(0, 2)
		.join(' ')
		.split('?')[0]
		.replace(/fluids\/[^/]+\//, 'fluids/{id}/')} ${status}`;
	seen.set(key, (seen.get(key) ?? 0) + 1);
};

async function check(
	r: { status: number; text: string; body: unknown },
	what: string
): Promise<void> {
	tally(what, r.status);
	expect(r.status, `${what} answered ${r.status}: ${r.text.slice(0, 300)}`).toBeLessThan(500);
	if (r.status === 200) {
		expect(r.text).not.toMatch(/\bNaN\b|\bInfinity\b/);
		expect(r.body, what).toBeTypeOf('object');
		checkNumbers(r.body);
		return;
	}
	expect(r.status).toBeGreaterThanOrEqual(400);
	const error = (r.body as { error?: { code?: unknown; message?: unknown } } | null)?.error;
	expect(error, `${what}: ${r.text.slice(0, 200)}`).toBeDefined();
	expect(typeof error!.code).toBe('string');
	expect(typeof error!.message).toBe('string');
	expect((error!.message as string).length).toBeGreaterThan(10);
	// an unexpected failure in the engine is answered 422 compute-failed: that is a bug to report, not an answer
	expect(error!.code, `${what}: ${r.text.slice(0, 300)}`).not.toBe('compute-failed');
}

type Post = Parameters<typeof callRoute>[0];
function fuzzPost(route: Post, url: string, near: fc.Arbitrary<unknown>, numRuns: number) {
	return fc.assert(
		fc.asyncProperty(body(near), async ({ text, type }) => {
			const r = await callRoute(route, url, {
				method: 'POST',
				body: text,
				headers: { 'content-type': type }
			});
			await check(r, `POST ${url} ${text.slice(0, 300)}`);
		}),
		{ seed: SEED, numRuns }
	);
}

const numberList = fc
	.array(fc.oneof(value('P'), value('T'), value('v')), { minLength: 1, maxLength: 12 })
	.map((vs) => vs.map((v) => String(v)).join(','));
const queryPart = (k: string, v: fc.Arbitrary<string>, freq = 15) =>
	maybe(v, freq).map((x) => (x === undefined ? '' : `${k}=${encodeURIComponent(x)}`));

describe('compute routes under seeded fuzz: never a 5xx, always the error shape, never NaN', () => {
	it('POST /api/v1/states', () => fuzzPost(states, '/api/v1/states', stateBody, 400));
	it('POST /api/v1/legs', () => fuzzPost(legs, '/api/v1/legs', legBody, 150));
	it('POST /api/v1/paths', () => fuzzPost(paths, '/api/v1/paths', pathBody, 120));

	it('GET /api/v1/fluids/{id}/isolines', () =>
		fc.assert(
			fc.asyncProperty(
				fc.constantFrom(...FLUIDS.filter(Boolean), 'unknown'),
				queryPart(
					'kind',
					fc.oneof(
						{ weight: 12, arbitrary: fc.constantFrom('isobar', 'isotherm', 'isochore') },
						{ weight: 1, arbitrary: fc.string() }
					)
				),
				queryPart(
					'values',
					fc.oneof({ weight: 12, arbitrary: numberList }, { weight: 1, arbitrary: fc.string() })
				),
				queryPart(
					'points',
					fc.oneof(
						{ weight: 8, arbitrary: fc.integer({ min: 20, max: 120 }).map(String) },
						{ weight: 1, arbitrary: fc.constantFrom('0', '2000', '4001', '1e3', '-5', 'x') }
					),
					3
				),
				queryPart('formulation', fc.constantFrom('if97', 'iapws95', 'IF97', ''), 3),
				fc.oneof(
					{ weight: 12, arbitrary: fc.constant('') },
					{ weight: 1, arbitrary: fc.string().map((x) => `extra=${encodeURIComponent(x)}`) }
				),
				async (id, ...parts) => {
					const url = `/api/v1/fluids/${encodeURIComponent(id)}/isolines?${parts.filter(Boolean).join('&')}`;
					await check(await callRoute(isolines, url, { params: { id } }), `GET ${url}`);
				}
			),
			{ seed: SEED, numRuns: 80 }
		));

	it('GET /api/v1/fluids/{id}/saturation', () =>
		fc.assert(
			fc.asyncProperty(
				fc.constantFrom(...FLUIDS.filter(Boolean), 'unknown'),
				queryPart(
					'points',
					fc.oneof(
						{ weight: 6, arbitrary: fc.integer({ min: 2, max: 300 }).map(String) },
						{
							weight: 1,
							arbitrary: fc.constantFrom('1', '1001', '99999999999999', '2.5', '', 'NaN')
						}
					),
					3
				),
				queryPart('formulation', fc.constantFrom('if97', 'iapws95', 'IF97', ''), 2),
				fc.oneof(
					{ weight: 12, arbitrary: fc.constant('') },
					{ weight: 1, arbitrary: fc.string().map((x) => `colour=${encodeURIComponent(x)}`) }
				),
				async (id, ...parts) => {
					const url = `/api/v1/fluids/${encodeURIComponent(id)}/saturation?${parts.filter(Boolean).join('&')}`;
					await check(await callRoute(saturation, url, { params: { id } }), `GET ${url}`);
				}
			),
			{ seed: SEED, numRuns: 50 }
		));

	it('GET /api/v1/fluids', () =>
		fc.assert(
			fc.asyncProperty(
				fc.oneof(
					fc.constant(''),
					fc.string().map((s) => `?${encodeURIComponent(s)}=1`)
				),
				async (q) => {
					await check(await callRoute(fluidsList, `/api/v1/fluids${q}`), `GET /api/v1/fluids${q}`);
				}
			),
			{ seed: SEED, numRuns: 30 }
		));

	it('reached the engine as well as the schemas: every compute route both answered and refused', () => {
		const count = (route: string, ok: boolean) =>
			[...seen]
				.filter(([k]) => k.startsWith(route + ' ') && k.endsWith(' 200') === ok)
				.reduce((a, [, n]) => a + n, 0);
		for (const route of [
			'POST /api/v1/states',
			'POST /api/v1/legs',
			'POST /api/v1/paths',
			'GET /api/v1/fluids/{id}/isolines',
			'GET /api/v1/fluids/{id}/saturation'
		]) {
			expect(count(route, true), `${route} answered`).toBeGreaterThanOrEqual(5);
			expect(count(route, false), `${route} refused`).toBeGreaterThanOrEqual(5);
		}
	});
});
