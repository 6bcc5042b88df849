/**
 * Validation of sheet documents (zod) and migration of older ones. Every draft the server
 * stores passes `parseSheetDoc`; a document of an older shape is brought forward first:
 *
 * - version 1: the current shape (types.ts).
 * - no version (documents written before versioning, and bare PathSpec bodies that scripts send
 *   to create a sheet): the spec is taken from `spec` or from the top level; missing units,
 *   chart preferences, title block and description get their defaults (the atmosphere from
 *   `atmosphericPressure`); legs without an id, or with a duplicate one, get fresh ids.
 * - a version newer than this server knows is refused, never guessed at.
 * - stored documents (`{ stored: true }`) written before control characters were refused in text
 *   fields: those characters are dropped on reading (tabs and line breaks in the title block
 *   become spaces), so such a sheet still opens. Documents a client sends are refused instead.
 *
 * Messages say what to give instead. Everything physical is SI (K, Pa absolute, m³/kg, J/kg).
 */
import { z } from 'zod';
import * as engine from '$lib/thermo';
import { PROCESSES, ROOT_HINTS, ThermoError, fluids } from '$lib/thermo';
import type { RootHint } from '$lib/thermo/types';
import { fillStart } from './fill';
import { DEFAULT_UNIT_PREFS } from '$lib/units/prefs';
import {
	DEFAULT_CHART,
	EMPTY_TITLE_BLOCK,
	INVARIANT,
	LEG_ID_PATTERN,
	MAX_SHEET_LEGS,
	START,
	newLegId
} from './doc';
import { SHEET_DOC_VERSION, type ChartView, type LineKind, type SheetDoc } from './types';
import { CHART_VIEW_VALUES, LINE_KINDS } from './chart-views';
import { cleanText, plainText, type TextKind } from '$lib/plain-text';

const INPUT_NAMES = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'] as const;
const UNIT: Record<(typeof INPUT_NAMES)[number], string> = {
	T: 'K',
	P: 'Pa (absolute)',
	v: 'm³/kg',
	rho: 'kg/m³',
	u: 'J/kg',
	h: 'J/kg',
	s: 'J/(kg·K)',
	x: '0…1'
};

const finite = (name: string, unit: string) =>
	z
		.number({
			error: (iss) =>
				iss.input === undefined
					? `${name} is required (a number in ${unit}).`
					: `${name} must be a number in ${unit}.`
		})
		.refine(Number.isFinite, {
			message: `${name} must be a finite number in ${unit}.`
		});
const positive = (name: string, unit: string) =>
	finite(name, unit).refine((v) => v > 0, { message: `${name} must be above zero (${unit}).` });

function property(name: (typeof INPUT_NAMES)[number]) {
	if (name === 'x')
		return finite('x', UNIT.x).refine((v) => v >= 0 && v <= 1, {
			message: 'x (quality) must be from 0 to 1.'
		});
	if (name === 'T' || name === 'P' || name === 'v' || name === 'rho')
		return positive(name, UNIT[name]);
	return finite(name, UNIT[name]);
}

const propertyShape = Object.fromEntries(INPUT_NAMES.map((k) => [k, property(k).optional()]));

const present = (o: Record<string, unknown>) => Object.keys(o).filter((k) => o[k] !== undefined);

const inputsSchema = z
	.strictObject(propertyShape, {
		error: 'The start state must be an object of two properties, e.g. { "T": 373.15, "x": 0.5 }.'
	})
	.superRefine((o, ctx) => {
		const keys = present(o);
		if (keys.includes('v') && keys.includes('rho'))
			ctx.addIssue({
				code: 'custom',
				message:
					'v and rho are the same property; fix the start state with one of them and another property.'
			});
		else if (keys.length !== 2)
			ctx.addIssue({
				code: 'custom',
				message: `The start state needs exactly two properties (of T, P, v, rho, u, h, s, x); got ${keys.length ? keys.join(', ') : 'none'}.`
			});
	});

const targetSchema = z
	.strictObject(propertyShape, {
		error: 'A leg target must be an object of one property, e.g. { "T": 450 }.'
	})
	.superRefine((o, ctx) => {
		const keys = present(o);
		if (keys.length !== 1)
			ctx.addIssue({
				code: 'custom',
				message: `A leg ends on exactly one target property; got ${keys.length ? keys.join(' and ') : 'none'}.`
			});
	});

const HINTS = ROOT_HINTS as [RootHint, ...RootHint[]];
const hintSchema = (name: string) =>
	z.enum(HINTS, { error: `${name} must be one of ${HINTS.join(', ')}.` });

/** The state picked where a pair meets several: its T (K) and/or P (Pa). */
const nearSchema = (name: string) =>
	z.strictObject(
		{
			T: positive(`${name}.T`, 'K').optional(),
			P: positive(`${name}.P`, 'Pa, absolute').optional()
		},
		{ error: `${name} must be an object { T?, P? } (K, Pa absolute).` }
	);

/** The range every state of the sheet is solved within (docs/engine-states.md). */
const windowSchema = z
	.strictObject(
		{
			Tmin: positive('window.Tmin', 'K').optional(),
			Tmax: positive('window.Tmax', 'K').optional(),
			Pmin: positive('window.Pmin', 'Pa, absolute').optional(),
			Pmax: positive('window.Pmax', 'Pa, absolute').optional()
		},
		{ error: 'window must be an object { Tmin?, Tmax?, Pmin?, Pmax? } (K, Pa absolute).' }
	)
	.refine(
		(w) =>
			!(w.Tmin !== undefined && w.Tmax !== undefined && w.Tmin > w.Tmax) &&
			!(w.Pmin !== undefined && w.Pmax !== undefined && w.Pmin > w.Pmax),
		{ message: 'window is empty: give each lower bound (Tmin, Pmin) below its upper bound.' }
	);

const legSchema = z
	.strictObject(
		{
			id: z
				.string({ error: 'Every leg needs an id (text).' })
				.regex(LEG_ID_PATTERN, {
					error:
						'A leg id is 1 to 40 letters, digits, "_", "." or "-", starting with a letter or digit.'
				})
				.refine((id) => id !== START, {
					message: `"${START}" names the first state; give the leg another id.`
				}),
			process: z.enum(PROCESSES as unknown as [string, ...string[]], {
				error: `process must be one of ${PROCESSES.join(', ')}.`
			}),
			target: targetSchema,
			n: finite('n', 'dimensionless')
				.refine((n) => Math.abs(n) <= 50, { message: 'n must be from −50 to 50.' })
				.optional(),
			samples: z.number().int().min(20).max(1000).optional(),
			endHint: hintSchema('endHint').optional(),
			endNear: nearSchema('endNear').optional(),
			to: z
				.literal('saturation', {
					error:
						'A leg\'s "to" can only be "saturation" (ending on the saturation line, with target x 0 or 1).'
				})
				.optional()
		},
		{ error: 'A leg must be an object { id, process, target, n?, to? }.' }
	)
	.superRefine((l, ctx) => {
		if (l.process === 'polytropic' && l.n === undefined)
			ctx.addIssue({
				code: 'custom',
				path: ['n'],
				message: 'A polytropic leg needs n (P·vⁿ = const), e.g. 1.3.'
			});
		if (l.process !== 'polytropic' && l.n !== undefined)
			ctx.addIssue({
				code: 'custom',
				path: ['n'],
				message: `n belongs to polytropic legs only; remove it from this ${l.process} leg.`
			});
		const inv = INVARIANT[l.process as keyof typeof INVARIANT];
		const keys = present(l.target);
		if (
			l.to === 'saturation' &&
			!(keys.length === 1 && keys[0] === 'x' && (l.target.x === 0 || l.target.x === 1))
		)
			ctx.addIssue({
				code: 'custom',
				path: ['target'],
				message:
					'A leg "to saturation" ends on the saturated-liquid (x = 0) or saturated-vapor line (x = 1): give target { "x": 0 } or { "x": 1 }.'
			});
		if (inv && (keys.includes(inv) || (inv === 'v' && keys.includes('rho'))))
			ctx.addIssue({
				code: 'custom',
				path: ['target'],
				message: `An ${l.process} leg keeps ${inv} constant, so it cannot end on ${inv}; give another target property.`
			});
	});

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
	{ error: 'system must be { kind: "closed", mass? or volume? } or { kind: "flow", massFlow }.' }
);

const limitsSchema = z.strictObject(
	{
		designPressure: positive('limits.designPressure', 'Pa, absolute').optional(),
		designTemperature: positive('limits.designTemperature', 'K').optional(),
		reliefSetPressure: positive('limits.reliefSetPressure', 'Pa, absolute').optional(),
		minimumTemperature: positive('limits.minimumTemperature', 'K').optional()
	},
	{
		error:
			'limits must be an object of designPressure, designTemperature, reliefSetPressure, minimumTemperature (Pa absolute, K).'
	}
);

/** Atmospheric pressure a site can have: 20 kPa (far above any plant) to 120 kPa (below sea level, weather). */
export const ATMOSPHERE_RANGE = { min: 20_000, max: 120_000 } as const;

const unitsSchema = z.strictObject(
	{
		system: z.enum(['si', 'us'], { error: 'units.system must be "si" or "us".' }),
		pressureUnit: z.enum(['kPa', 'MPa', 'bar', 'auto'], {
			error: 'units.pressureUnit must be kPa, MPa, bar or auto.'
		}),
		pressureReference: z.enum(['absolute', 'gauge'], {
			error: 'units.pressureReference must be "absolute" or "gauge".'
		}),
		usPower: z.enum(['Btu/h', 'hp'], { error: 'units.usPower must be "Btu/h" or "hp".' }),
		atmosphere: positive('units.atmosphere', 'Pa, absolute').refine(
			(p) => p >= ATMOSPHERE_RANGE.min && p <= ATMOSPHERE_RANGE.max,
			{
				message:
					'The site’s atmospheric pressure must be from 20 to 120 kPa a (101.325 kPa a at sea level).'
			}
		)
	},
	{
		error:
			'units must be an object { system, pressureUnit, pressureReference, usPower, atmosphere }.'
	}
);

const text = (name: string, max: number, kind: TextKind = 'line') =>
	plainText(name, kind).max(max, { error: `${name} must be at most ${max} characters.` });

const titleBlockSchema = z.strictObject(
	{
		project: text('Project', 120),
		equipment: text('Equipment', 120),
		tag: text('Tag', 60),
		documentNumber: text('Document number', 60),
		site: text('Site', 120)
	},
	{ error: 'titleBlock must be an object { project, equipment, tag, documentNumber, site }.' }
);

/** The ids a sheet, form or request may name as its fluid. */
export const fluidIds = (): [string, ...string[]] =>
	fluids.map((f) => f.id) as [string, ...string[]];

const fluidSchema = z
	.string({ error: 'spec.fluid must be a fluid id such as "water".' })
	.refine((f) => fluidIds().includes(f), {
		message: `spec.fluid must be one of ${fluidIds().join(', ')}.`
	});

const specSchema = z
	.strictObject(
		{
			fluid: fluidSchema,
			system: systemSchema,
			start: inputsSchema,
			legs: z
				.array(legSchema, { error: 'spec.legs must be a list of legs.' })
				.max(MAX_SHEET_LEGS, { error: `A sheet holds at most ${MAX_SHEET_LEGS} legs.` }),
			limits: limitsSchema.optional(),
			atmosphericPressure: positive('spec.atmosphericPressure', 'Pa, absolute').optional(),
			samples: z.number().int().min(20).max(200).optional(),
			startHint: hintSchema('startHint').optional(),
			startNear: nearSchema('startNear').optional(),
			window: windowSchema.optional(),
			formulation: z
				.enum(['iapws95', 'if97'], {
					error:
						'spec.formulation must be "iapws95" (IAPWS-95, the default) or "if97" (IAPWS-IF97, water only).'
				})
				.optional()
		},
		{ error: 'spec must be an object { fluid, system, start, legs, limits?, window? }.' }
	)
	.superRefine((s, ctx) => {
		if (s.formulation === 'if97' && s.fluid !== 'water')
			ctx.addIssue({
				code: 'custom',
				path: ['formulation'],
				message: `spec.formulation "if97" (IAPWS-IF97) is for water only; this sheet is of ${s.fluid}. Leave it out (the fluid's own equation of state) or make the fluid water.`
			});
		const seen = new Set<string>();
		s.legs.forEach((l, i) => {
			if (seen.has(l.id))
				ctx.addIssue({
					code: 'custom',
					path: ['legs', i, 'id'],
					message: `Two legs have the id "${l.id}"; every leg needs its own.`
				});
			seen.add(l.id);
		});
	});

const startSpecSchema = z
	.strictObject(
		{
			kind: z.literal('fill', {
				error:
					'startSpec.kind must be "fill" (a liquid volume fraction at a temperature or pressure).'
			}),
			fraction: finite('startSpec.fraction', '0…1, liquid volume / vessel volume').refine(
				(f) => f >= 0 && f <= 1,
				{
					message:
						'startSpec.fraction is the liquid volume fraction, from 0 (all vapor) to 1 (all liquid), e.g. 0.8 for 80 % full.'
				}
			),
			T: positive('startSpec.T', 'K').optional(),
			P: positive('startSpec.P', 'Pa (absolute)').optional()
		},
		{ error: 'startSpec must be an object { kind: "fill", fraction, T or P }.' }
	)
	.refine((f) => (f.T === undefined) !== (f.P === undefined), {
		message:
			'startSpec gives the fill at a temperature T or at a pressure P: one of them, not both.'
	});

export const sheetDocSchema = z
	.strictObject(
		{
			version: z.literal(SHEET_DOC_VERSION, { error: `version must be ${SHEET_DOC_VERSION}.` }),
			startSpec: startSpecSchema.optional(),
			description: text('The description', 2000, 'lines'),
			spec: specSchema,
			units: unitsSchema,
			chart: z.strictObject(
				{
					view: z.enum(CHART_VIEW_VALUES as unknown as [ChartView, ...ChartView[]], {
						error:
							'chart.view must be one view ("T-v", "P-v", "P-h", "T-s" or "h-s"), two joined by "+" (e.g. "P-h+T-s"), or "both" (T–v and P–v).'
					}),
					pressureScale: z.enum(['log', 'linear'], {
						error: 'chart.pressureScale must be "log" or "linear".'
					}),
					isolines: z.boolean({ error: 'chart.isolines must be true or false.' }),
					lines: z
						.array(
							z.enum(LINE_KINDS as unknown as [LineKind, ...LineKind[]], {
								error: `chart.lines holds line kinds: ${LINE_KINDS.join(', ')}.`
							}),
							{ error: `chart.lines must be a list of line kinds (${LINE_KINDS.join(', ')}).` }
						)
						.max(LINE_KINDS.length)
						.refine((l) => new Set(l).size === l.length, {
							message: 'chart.lines names each kind at most once.'
						})
						.optional()
				},
				{ error: 'chart must be an object { view, pressureScale, isolines, lines? }.' }
			),
			titleBlock: titleBlockSchema
		},
		{
			error:
				'A sheet document must be an object { version, description, spec, units, chart, titleBlock }.'
		}
	)
	.superRefine((d, ctx) => {
		if (!d.startSpec) return;
		if (d.spec.system.kind !== 'closed')
			ctx.addIssue({
				code: 'custom',
				path: ['startSpec'],
				message:
					'A start by fill level is for a closed system (a vessel); a steady-flow device starts from two properties.'
			});
		try {
			fillStart(engine, d.spec.fluid, d.startSpec);
		} catch (e) {
			if (!(e instanceof ThermoError || e instanceof RangeError)) throw e;
			ctx.addIssue({
				code: 'custom',
				path: ['startSpec'],
				message: `No fill level there: ${e.message} Give a temperature or pressure between the triple point and the critical point.`
			});
		}
	})
	// the spec carries the sheet's atmosphere for the engine; the units are its one source. A fill
	// spec fixes the start: its T and v are written into spec.start (the engine reads two properties)
	.transform((d) => {
		const spec = { ...d.spec, atmosphericPressure: d.units.atmosphere };
		if (d.startSpec) spec.start = fillStart(engine, d.spec.fluid, d.startSpec);
		return { ...d, spec };
	});

export interface DocIssue {
	path: string;
	message: string;
}

export type ParsedDoc =
	| { ok: true; doc: SheetDoc; migratedFrom: number | null }
	| { ok: false; message: string; issues: DocIssue[] };

function isObject(v: unknown): v is Record<string, unknown> {
	return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** An unversioned document (or a bare PathSpec) in the version-1 shape, defaults filled in. */
function fromUnversioned(raw: Record<string, unknown>): unknown {
	const spec: Record<string, unknown> = isObject(raw.spec)
		? { ...raw.spec }
		: Object.fromEntries(
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
					'window'
				]
					.filter((k) => k in raw)
					.map((k) => [k, raw[k]])
			);
	const units = { ...DEFAULT_UNIT_PREFS, ...(isObject(raw.units) ? raw.units : {}) } as Record<
		string,
		unknown
	>;
	if (!isObject(raw.units) && typeof spec.atmosphericPressure === 'number')
		units.atmosphere = spec.atmosphericPressure;
	if (Array.isArray(spec.legs)) {
		const taken = new Set<string>();
		spec.legs = spec.legs.map((leg) => {
			if (!isObject(leg)) return leg;
			let id =
				typeof leg.id === 'string' &&
				LEG_ID_PATTERN.test(leg.id) &&
				leg.id !== START &&
				!taken.has(leg.id)
					? leg.id
					: null;
			id ??= newLegId(taken);
			taken.add(id);
			return { ...leg, id };
		});
	}
	return {
		version: SHEET_DOC_VERSION,
		description: typeof raw.description === 'string' ? raw.description : '',
		spec,
		units,
		chart: { ...DEFAULT_CHART, ...(isObject(raw.chart) ? raw.chart : {}) },
		titleBlock: { ...EMPTY_TITLE_BLOCK, ...(isObject(raw.titleBlock) ? raw.titleBlock : {}) }
	};
}

/** The description and title block of a stored document without control characters (see the module comment). */
function cleanStored(doc: unknown): unknown {
	if (!isObject(doc)) return doc;
	const out: Record<string, unknown> = { ...doc };
	if (typeof out.description === 'string') out.description = cleanText(out.description, 'lines');
	if (isObject(out.titleBlock))
		out.titleBlock = Object.fromEntries(
			Object.entries(out.titleBlock).map(([k, v]) => [
				k,
				typeof v === 'string' ? cleanText(v, 'line') : v
			])
		);
	return out;
}

/**
 * Validate a sent document (`stored: false`, the default: control characters refused) or a stored
 * one (`stored: true`), migrating older shapes first (see the module comment).
 */
export function parseSheetDoc(
	raw: unknown,
	{ stored = false }: { stored?: boolean } = {}
): ParsedDoc {
	if (!isObject(raw))
		return {
			ok: false,
			message: 'A sheet document must be a JSON object.',
			issues: [{ path: '', message: 'A sheet document must be a JSON object.' }]
		};
	let input: unknown = raw;
	let migratedFrom: number | null = null;
	if (raw.version === undefined) {
		input = fromUnversioned(raw);
		migratedFrom = 0;
	} else if (typeof raw.version !== 'number' || !Number.isInteger(raw.version) || raw.version < 1) {
		const message = `version must be a whole number from 1 to ${SHEET_DOC_VERSION}.`;
		return { ok: false, message, issues: [{ path: 'version', message }] };
	} else if (raw.version > SHEET_DOC_VERSION) {
		const message = `This document has version ${raw.version}, newer than this server reads (${SHEET_DOC_VERSION}). Update Statewright, or send a version-${SHEET_DOC_VERSION} document.`;
		return { ok: false, message, issues: [{ path: 'version', message }] };
	}
	const r = sheetDocSchema.safeParse(stored ? cleanStored(input) : input);
	if (!r.success) {
		const issues = r.error.issues.map((i) => ({
			path: i.path.map(String).join('.'),
			message: i.message
		}));
		const first = issues[0];
		const message =
			issues.length === 1
				? first.path
					? `${first.path}: ${first.message}`
					: first.message
				: `${issues.length} problems in the sheet document; the first: ${first.path ? `${first.path}: ` : ''}${first.message}`;
		return { ok: false, message, issues };
	}
	return { ok: true, doc: r.data as SheetDoc, migratedFrom };
}
