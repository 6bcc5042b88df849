import { z } from 'zod';
import {
	API_ISOLINE_POINTS_MAX,
	ISOLINE_WEIGHT,
	API_PATH_POINTS_MAX,
	API_SAMPLES_MAX,
	API_SATURATION_POINTS_MAX,
	pathPoints
} from '$lib/compute-limits';
import {
	ISOLINE_KINDS,
	ISOLINE_POINTS_DEFAULT,
	ISOLINE_POINTS_MAX,
	ISOLINE_POINTS_MIN,
	ISOLINE_VALUES_MAX,
	MAX_LEGS,
	N_MAX,
	PROCESSES,
	ROOT_HINTS,
	SAMPLES_DEFAULT,
	TARGET_NAMES,
	type FixOptions,
	type Inputs,
	type LegSpec,
	type PathSpec,
	type Process,
	type RootHint
} from '$lib/thermo';

/*
 * Request shapes of the compute API (docs/compute-api.md), checked before the engine sees them. Everything is SI:
 * T K, P Pa (absolute), v m³/kg, rho kg/m³, u h J/kg, s J/(kg·K), x 0…1. Objects are strict: an
 * unknown field is refused by name, so a typo ("temp", "Pa") never passes silently.
 */

// Work caps (points × lines, legs × points), shared with the browser's API client.
export {
	API_ISOLINE_POINTS_MAX,
	API_PATH_POINTS_MAX,
	API_SAMPLES_MAX,
	API_SATURATION_POINTS_MAX,
	pathPoints
} from '$lib/compute-limits';

const UNITS: Record<string, string> = {
	T: 'K',
	P: 'Pa (absolute)',
	v: 'm³/kg',
	rho: 'kg/m³',
	u: 'J/kg',
	h: 'J/kg',
	s: 'J/(kg·K)',
	x: '(0…1)'
};
const ABSOLUTE = new Set(['T', 'P', 'v', 'rho']);
const INPUT_NAMES = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'] as const;

function got(input: unknown): string {
	if (input === undefined) return 'nothing';
	if (typeof input === 'string')
		return `the text ${JSON.stringify(input.length > 40 ? input.slice(0, 40) + '…' : input)}`;
	if (Array.isArray(input)) return 'a list';
	if (input === null) return 'null';
	if (typeof input === 'object') return 'an object';
	return String(input);
}

/** A finite number with a message naming the field and its unit. */
export function num(name: string, unit: string) {
	return z.number({
		error: (iss) =>
			iss.input === undefined
				? `${name} is required (a number in ${unit}).`
				: `${name} must be a number in ${unit}; got ${got(iss.input)}.`
	});
}

/** A property value of a state: positive for T, P, v, rho; 0…1 for x. */
function property(name: string) {
	const base = num(name, UNITS[name]);
	if (name === 'x')
		return base
			.min(0, { error: 'x (quality) must be from 0 to 1.' })
			.max(1, { error: 'x (quality) must be from 0 to 1.' });
	if (ABSOLUTE.has(name))
		return base.positive({
			error: `${name} must be positive: absolute ${name === 'P' ? 'pressure in Pa (not gauge)' : name === 'T' ? 'temperature in K (not °C)' : `values in ${UNITS[name]}`}.`
		});
	return base;
}

const propertyShape = Object.fromEntries(
	INPUT_NAMES.map((k) => [k, property(k).optional()])
) as Record<(typeof INPUT_NAMES)[number], z.ZodOptional<z.ZodNumber>>;

function objectError(what: string, example: string, allowed?: readonly string[]) {
	return (iss: { input?: unknown; code?: string; keys?: string[] }) => {
		if (iss.code === 'unrecognized_keys') {
			const keys = iss.keys ?? [];
			return `Unknown field${keys.length > 1 ? 's' : ''} ${keys.map((k) => `"${k}"`).join(', ')} in ${what}${allowed ? `; allowed: ${allowed.join(', ')}` : ''} (names are case-sensitive, values SI).`;
		}
		return iss.input === undefined
			? `${what} is required, e.g. ${example}.`
			: `${what} must be an object like ${example}; got ${got(iss.input)}.`;
	};
}

/** Exactly two of T, P, v, rho, u, h, s, x (not v with rho). */
export const inputsSchema = z
	.strictObject(propertyShape, {
		error: objectError('inputs', '{ "T": 450, "P": 1e6 }', INPUT_NAMES)
	})
	.superRefine((o, ctx) => {
		const keys = Object.keys(o).filter((k) => o[k as keyof typeof o] !== undefined);
		if (keys.includes('v') && keys.includes('rho'))
			ctx.addIssue({
				code: 'custom',
				message:
					'v and rho are the same property (rho = 1/v); give one of them with another property.'
			});
		else if (keys.length !== 2)
			ctx.addIssue({
				code: 'custom',
				message: `A state needs exactly two properties (of T, P, v, rho, u, h, s, x); got ${keys.length ? keys.join(', ') : 'none'}.`
			});
	});

/** Exactly one target property. */
export const targetSchema = z
	.strictObject(propertyShape, { error: objectError('target', '{ "T": 500 }', INPUT_NAMES) })
	.superRefine((o, ctx) => {
		const keys = Object.keys(o).filter((k) => o[k as keyof typeof o] !== undefined);
		if (keys.length !== 1)
			ctx.addIssue({
				code: 'custom',
				message: `A leg ends on exactly one target property (one of ${TARGET_NAMES.join(', ')}); got ${keys.length ? keys.join(' and ') : 'none'}.`
			});
	});

export const fluidSchema = z
	.string({
		error: (iss) =>
			iss.input === undefined
				? 'fluid is required, e.g. "water".'
				: `fluid must be a fluid id such as "water"; got ${got(iss.input)}.`
	})
	.trim()
	.min(1, { error: 'fluid must not be empty; use an id such as "water".' })
	.max(64, { error: 'fluid is too long; use an id such as "water".' });

const processSchema = z.enum(PROCESSES as [Process, ...Process[]], {
	error: (iss) => `process must be one of ${PROCESSES.join(', ')}; got ${got(iss.input)}.`
});

const nSchema = num('n', '(dimensionless)')
	.min(-N_MAX, { error: `n must be from −${N_MAX} to ${N_MAX}.` })
	.max(N_MAX, { error: `n must be from −${N_MAX} to ${N_MAX}.` });

const samplesSchema = num('samples', 'points')
	.int({ error: 'samples must be a whole number.' })
	.min(20, { error: 'samples must be at least 20.' })
	.max(API_SAMPLES_MAX, { error: `samples must be at most ${API_SAMPLES_MAX}.` });

function needsN(o: { process: string; n?: number }, ctx: z.RefinementCtx) {
	if (o.process === 'polytropic' && o.n === undefined)
		ctx.addIssue({
			code: 'custom',
			path: ['n'],
			message: 'A polytropic leg needs n (P·vⁿ = const), e.g. "n": 1.3.'
		});
	if (o.process !== 'polytropic' && o.n !== undefined)
		ctx.addIssue({
			code: 'custom',
			path: ['n'],
			message: `n belongs to polytropic legs only; remove it for an ${o.process} leg.`
		});
}

const positive = (name: string, unit: string) =>
	num(name, unit).positive({ error: `${name} must be positive (${unit}).` });

/** `near`: the state to stay close to where several have the inputs (T K and/or P Pa). */
const nearFor = (name: string) =>
	z.strictObject(
		{
			T: positive(`${name}.T`, 'K').optional(),
			P: positive(`${name}.P`, 'Pa, absolute').optional()
		},
		{ error: objectError(name, '{ "T": 300, "P": 1e6 }', ['T', 'P']) }
	);
const nearSchema = nearFor('near');

/** `window`: bounds on the answer (T K, P Pa); roots outside are not answers. */
const windowSchema = z
	.strictObject(
		{
			Tmin: positive('window.Tmin', 'K').optional(),
			Tmax: positive('window.Tmax', 'K').optional(),
			Pmin: positive('window.Pmin', 'Pa, absolute').optional(),
			Pmax: positive('window.Pmax', 'Pa, absolute').optional()
		},
		{
			error: objectError('window', '{ "Pmin": 1e5, "Pmax": 1e7 }', ['Tmin', 'Tmax', 'Pmin', 'Pmax'])
		}
	)
	.refine(
		(w) =>
			!(w.Tmin !== undefined && w.Tmax !== undefined && w.Tmin > w.Tmax) &&
			!(w.Pmin !== undefined && w.Pmax !== undefined && w.Pmin > w.Pmax),
		{
			message:
				'window is empty: give each lower bound (Tmin, Pmin) below its upper bound (Tmax, Pmax).'
		}
	);

const HINTS = ROOT_HINTS as [RootHint, ...RootHint[]];

/** A root hint; `name` is the field's name in messages. */
const hintSchema = (name: string) =>
	z.enum(HINTS, {
		error: (iss) => `${name} must be one of ${HINTS.join(', ')}; got ${got(iss.input)}.`
	});

export const stateRequestSchema = z.strictObject(
	{
		fluid: fluidSchema,
		inputs: inputsSchema,
		hint: hintSchema('hint').optional(),
		near: nearSchema.optional(),
		window: windowSchema.optional()
	},
	{
		error: objectError('the body', '{ "fluid": "water", "inputs": { "T": 450, "P": 1e6 } }', [
			'fluid',
			'inputs',
			'hint',
			'near',
			'window'
		])
	}
);

export const legRequestSchema = z
	.strictObject(
		{
			fluid: fluidSchema,
			start: inputsSchema,
			process: processSchema,
			target: targetSchema,
			n: nSchema.optional(),
			samples: samplesSchema.optional(),
			startHint: hintSchema('startHint').optional(),
			startNear: nearFor('startNear').optional(),
			endHint: hintSchema('endHint').optional(),
			endNear: nearFor('endNear').optional(),
			window: windowSchema.optional()
		},
		{
			error: objectError(
				'the body',
				'{ "fluid": "water", "start": { "T": 300, "P": 101325 }, "process": "isobaric", "target": { "T": 500 } }',
				[
					'fluid',
					'start',
					'process',
					'target',
					'n',
					'samples',
					'startHint',
					'startNear',
					'endHint',
					'endNear',
					'window'
				]
			)
		}
	)
	.superRefine(needsN);

const systemSchema = z.discriminatedUnion(
	'kind',
	[
		z
			.strictObject({
				kind: z.literal('closed'),
				mass: positive('system.mass', 'kg').optional(),
				volume: positive('system.volume', 'm³').optional()
			})
			.refine((s) => !(s.mass !== undefined && s.volume !== undefined), {
				message: 'Give the closed system’s mass or its volume, not both.'
			}),
		z.strictObject({ kind: z.literal('flow'), massFlow: positive('system.massFlow', 'kg/s') })
	],
	{
		error:
			'system must be { "kind": "closed", "mass" or "volume" } or { "kind": "flow", "massFlow" }.'
	}
);

const pathLegSchema = z
	.strictObject(
		{
			id: z
				.string({ error: 'A leg id must be text.' })
				.trim()
				.min(1, { error: 'A leg id must not be empty.' })
				.max(40, { error: 'A leg id must be at most 40 characters.' })
				.optional(),
			process: processSchema,
			target: targetSchema,
			n: nSchema.optional(),
			samples: samplesSchema.optional(),
			endHint: hintSchema('endHint').optional(),
			endNear: nearFor('endNear').optional()
		},
		{
			error: objectError('a leg', '{ "process": "isochoric", "target": { "T": 450 } }', [
				'id',
				'process',
				'target',
				'n',
				'samples',
				'endHint',
				'endNear'
			])
		}
	)
	.superRefine(needsN);

const limitsSchema = z.strictObject(
	{
		designPressure: positive('limits.designPressure', 'Pa, absolute').optional(),
		designTemperature: positive('limits.designTemperature', 'K').optional(),
		reliefSetPressure: positive('limits.reliefSetPressure', 'Pa, absolute').optional(),
		minimumTemperature: positive('limits.minimumTemperature', 'K').optional()
	},
	{
		error: objectError('limits', '{ "designPressure": 1.6e6 }', [
			'designPressure',
			'designTemperature',
			'reliefSetPressure',
			'minimumTemperature'
		])
	}
);

export const pathRequestSchema = z
	.strictObject(
		{
			fluid: fluidSchema,
			system: systemSchema,
			start: inputsSchema,
			legs: z
				.array(pathLegSchema, {
					error:
						'legs must be a list of legs, e.g. [{ "process": "isochoric", "target": { "T": 450 } }].'
				})
				.min(1, { error: 'A path needs at least one leg.' })
				.max(MAX_LEGS, { error: `A path may hold at most ${MAX_LEGS} legs.` }),
			limits: limitsSchema.optional(),
			atmosphericPressure: positive('atmosphericPressure', 'Pa').optional(),
			samples: samplesSchema.optional(),
			startHint: hintSchema('startHint').optional(),
			startNear: nearFor('startNear').optional(),
			window: windowSchema.optional(),
			formulation: z
				.enum(['iapws95', 'if97'], {
					error:
						'formulation must be "iapws95" (the default, the fluid\'s own equation of state) or "if97" (water by IAPWS-IF97).'
				})
				.optional()
		},
		{
			error: objectError(
				'the body',
				'{ "fluid": "water", "system": { "kind": "closed", "volume": 0.5 }, "start": {…}, "legs": […] }',
				[
					'fluid',
					'system',
					'start',
					'legs',
					'limits',
					'atmosphericPressure',
					'samples',
					'startHint',
					'startNear',
					'window',
					'formulation'
				]
			)
		}
	)
	.superRefine((p, ctx) => {
		const total = pathPoints(p);
		if (total > API_PATH_POINTS_MAX) {
			const fit = Math.max(20, Math.floor(API_PATH_POINTS_MAX / p.legs.length));
			ctx.addIssue({
				code: 'custom',
				path: ['legs'],
				message: `The path asks for ${total} points (${p.legs.length} legs × their samples); at most ${API_PATH_POINTS_MAX} per request (legs × points). Lower samples (for ${p.legs.length} legs, at most ${fit} each; leave it out for ${SAMPLES_DEFAULT}) or split the path.`
			});
		}
		if (p.formulation === 'if97' && p.fluid !== 'water')
			ctx.addIssue({
				code: 'custom',
				path: ['formulation'],
				message: `formulation "if97" (IAPWS-IF97) is for water only; this path is of ${p.fluid}. Leave formulation out, or make the fluid water.`
			});
		const ids = p.legs.map((l, i) => l.id ?? `L${i + 1}`);
		const dup = ids.find((id, i) => ids.indexOf(id) !== i);
		if (dup)
			ctx.addIssue({
				code: 'custom',
				path: ['legs'],
				message: `Two legs have the id "${dup}"; give every leg its own id.`
			});
	});

/** Query of GET …/saturation: points (2…1000, default 100); formulation (water: "if97" for IAPWS-IF97's dome). */
export const saturationQuerySchema = z.strictObject(
	{
		points: z
			.string()
			.regex(/^\d{1,12}$/, { error: 'points must be a whole number.' })
			.transform(Number)
			.pipe(
				z
					.number()
					.min(2, { error: 'points must be at least 2.' })
					.max(API_SATURATION_POINTS_MAX, {
						error: `points must be at most ${API_SATURATION_POINTS_MAX}.`
					})
			)
			.optional(),
		formulation: z
			.enum(['iapws95', 'if97'], {
				error:
					'formulation must be "iapws95" (the default, the fluid\'s own equation of state) or "if97" (water by IAPWS-IF97).'
			})
			.optional()
	},
	{ error: objectError('the query', '?points=100', ['points', 'formulation']) }
);

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Query of GET …/isolines: kind, values (comma-separated SI numbers), points; values × points ≤ API_ISOLINE_POINTS_MAX. */
export const isolineQuerySchema = z
	.strictObject(
		{
			kind: z.enum(ISOLINE_KINDS as unknown as [string, ...string[]], {
				error: (iss) => `kind must be one of ${ISOLINE_KINDS.join(', ')}; got ${got(iss.input)}.`
			}),
			values: z
				.string({
					error:
						'values is required: comma-separated SI numbers, e.g. values=1e5,1e6 (Pa for isobars, K for isotherms, m³/kg for isochores, J/(kg·K) for isentropes, J/kg for isenthalps, 0…1 for quality lines).'
				})
				.transform((s, ctx) => {
					const parts = s.split(',').map((p) => p.trim());
					if (parts.length > ISOLINE_VALUES_MAX) {
						ctx.addIssue({
							code: 'custom',
							message: `At most ${ISOLINE_VALUES_MAX} values per request; got ${parts.length}.`
						});
						return z.NEVER;
					}
					const bad = parts.find((p) => !NUMBER.test(p));
					if (bad !== undefined) {
						ctx.addIssue({
							code: 'custom',
							message: `values must be comma-separated numbers in SI units; "${bad.slice(0, 20)}" is not one.`
						});
						return z.NEVER;
					}
					const nums = parts.map(Number);
					if (nums.some((n) => !Number.isFinite(n))) {
						ctx.addIssue({
							code: 'custom',
							message:
								'values must be finite SI values (absolute pressure in Pa, temperature in K, v in m³/kg, s in J/(kg·K), h in J/kg, x from 0 to 1).'
						});
						return z.NEVER;
					}
					return nums;
				}),
			points: z
				.string()
				.regex(/^\d{1,12}$/, { error: 'points must be a whole number.' })
				.transform(Number)
				.pipe(
					z
						.number()
						.min(ISOLINE_POINTS_MIN, { error: `points must be at least ${ISOLINE_POINTS_MIN}.` })
						.max(ISOLINE_POINTS_MAX, { error: `points must be at most ${ISOLINE_POINTS_MAX}.` })
				)
				.default(ISOLINE_POINTS_DEFAULT),
			formulation: z
				.enum(['iapws95', 'if97'], {
					error:
						'formulation must be "iapws95" (the default, the fluid\'s own equation of state) or "if97" (water by IAPWS-IF97).'
				})
				.optional()
		},
		{
			error: objectError('the query', '?kind=isobar&values=1e5,1e6', [
				'kind',
				'values',
				'points',
				'formulation'
			])
		}
	)
	.superRefine((q, ctx) => {
		// s and h count from each fluid's reference state (either sign); a quality is 0…1
		const signed = q.kind === 'isentrope' || q.kind === 'isenthalp';
		const bad = q.values.find((v) =>
			q.kind === 'quality' ? !(v >= 0 && v <= 1) : !signed && !(v > 0)
		);
		if (bad !== undefined)
			ctx.addIssue({
				code: 'custom',
				path: ['values'],
				message:
					q.kind === 'quality'
						? `A quality line's x lies from 0 to 1; got ${bad}. Send values such as 0.1,0.5,0.9.`
						: `values must be positive, finite SI values (absolute pressure in Pa, temperature in K, v in m³/kg); got ${bad}.`
			});
		const weight = ISOLINE_WEIGHT[q.kind] ?? 1;
		const total = q.values.length * q.points * weight;
		if (total > API_ISOLINE_POINTS_MAX) {
			const fit = Math.floor(API_ISOLINE_POINTS_MAX / (q.values.length * weight));
			ctx.addIssue({
				code: 'custom',
				path: ['points'],
				message: `This asks for ${q.values.length} lines × ${q.points} points${weight > 1 ? ` × ${weight} (an ${q.kind} point costs ${weight})` : ''} = ${total} points; at most ${API_ISOLINE_POINTS_MAX} per request (values × points${weight > 1 ? ' × weight' : ''}). Send points=${fit} or less for ${q.values.length} lines, or fewer values per request.`
			});
		}
	});

export type LegRequest = z.infer<typeof legRequestSchema>;
export type PathRequest = z.infer<typeof pathRequestSchema>;

/** A GET route without query parameters: any given is refused by name. */
export const noQuerySchema = z.strictObject(
	{},
	{
		error: (iss: { code?: string; keys?: string[] }) =>
			`Unknown field${(iss.keys?.length ?? 0) > 1 ? 's' : ''} ${(iss.keys ?? []).map((k) => `"${k.slice(0, 40)}"`).join(', ')} in the query: this route takes no query parameters (every answer is SI).`
	}
);

/** `A` when it is assignable to `B`; otherwise svelte-check fails where it is used. */
type Assignable<A extends B, B> = A;

/** The keys on one side only (`never` when A and B have the same keys). */
type OneSided<A, B> = Exclude<keyof A, keyof B> | Exclude<keyof B, keyof A>;
/** `K` when it is `never`; a key named here fails svelte-check where it is used. */
type NoKeys<K extends never> = K;

/** A state request's options: everything but the fluid and the inputs goes to fixState as FixOptions. */
export type StateRequestOptions = Omit<z.infer<typeof stateRequestSchema>, 'fluid' | 'inputs'>;

/**
 * Compile-time ties between the request schemas and the engine's input types: a field added,
 * renamed or narrowed on one side and not the other fails svelte-check here. The state request
 * is tied both ways: its options must be assignable to FixOptions, and a field of FixOptions
 * the schema lacks (or one the schema has that FixOptions lacks) is named by `NoKeys`.
 */
export type SchemasMatchEngine = [
	Assignable<z.infer<typeof pathRequestSchema>, PathSpec>,
	Assignable<z.infer<typeof legRequestSchema>, LegSpec>,
	Assignable<z.infer<typeof stateRequestSchema>['inputs'], Inputs>,
	Assignable<StateRequestOptions, FixOptions>,
	NoKeys<OneSided<StateRequestOptions, FixOptions>>
];
