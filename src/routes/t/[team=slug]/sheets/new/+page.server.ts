import { redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { getDb } from '$lib/server/database';
import { requireTeam } from '$lib/server/guard';
import { formFailure, parseForm, readFormData, runAction } from '$lib/server/forms';
import { createFromExample, createSheet, titleSchema } from '$lib/server/sheets';
import { plainText } from '$lib/plain-text';
import * as engine from '$lib/thermo';
import { listFluids } from '$lib/thermo';
import { fillStart } from '$lib/sheets/fill';
import { fluidIds } from '$lib/sheets/schema';
import { readAcrossSaturation } from '$lib/sheets/saturation-input';
import type { StartSpec } from '$lib/sheets/types';
import { WORKED_EXAMPLES } from '$lib/sheets/templates';
import { makeDoc } from '$lib/sheets/doc';
import { parseQuantity, unitPrefs, type Quantity } from '$lib/units';
import type { PathSystem } from '$lib/thermo/types';

export const load: PageServerLoad = async (event) => {
	await requireTeam(event, event.params.team, 'sheet:edit');
	return {
		examples: WORKED_EXAMPLES.map((e) => ({
			id: e.id,
			title: e.title,
			fluid: e.fluid,
			story: e.story
		})),
		fluids: listFluids().map((f) => ({
			id: f.id,
			name: f.name,
			formula: f.formula,
			aliases: f.aliases,
			group: f.group,
			formulation: f.formulation.name
		}))
	};
};

// `fill`: the liquid's share of a vessel's volume, with T or P (saturation there) — fill.ts
const PROPS = ['T', 'P', 'v', 'u', 'h', 's', 'x', 'fill'] as const;
const QUANTITY: Record<(typeof PROPS)[number], Quantity> = {
	T: 'temperature',
	P: 'pressure',
	v: 'specificVolume',
	u: 'specificEnergy',
	h: 'specificEnergy',
	s: 'specificEntropy',
	x: 'quality',
	fill: 'fraction'
};

const text = (what: string, max = 60) =>
	plainText(`The ${what.replace(/^the /, '')}`, 'line', `Enter ${what}.`)
		.trim()
		.max(max, { error: `That is too long for ${what}.` });

const blankForm = z
	.object({
		title: titleSchema,
		fluid: z.enum(fluidIds(), { error: `Choose a fluid: ${fluidIds().join(', ')}.` }),
		size: z.enum(['mass', 'volume', 'perkg', 'flow'], {
			error: 'Choose what sizes the system: a mass, a volume, per kg, or a mass flow.'
		}),
		sizeValue: text('the size').optional(),
		propA: z.enum(PROPS, { error: 'Choose the first property of the start state.' }),
		valueA: text('the first property’s value').pipe(
			z.string().min(1, { error: 'Enter the first property’s value with its unit, e.g. 120 °C.' })
		),
		propB: z.enum(PROPS, { error: 'Choose the second property of the start state.' }),
		valueB: text('the second property’s value').pipe(
			z
				.string()
				.min(1, { error: 'Enter the second property’s value with its unit, e.g. 0.5 for quality.' })
		),
		unitSystem: z.enum(['si', 'us'], { error: 'Choose SI or US customary units.' }),
		pressureUnit: z
			.enum(['kPa', 'MPa', 'bar', 'auto'], { error: 'Choose a pressure unit.' })
			.default('kPa'),
		pressureReference: z.enum(['absolute', 'gauge'], {
			error: 'Choose absolute or gauge pressures.'
		}),
		atmosphere: text('the atmospheric pressure').optional()
	})
	.superRefine((f, ctx) => {
		if (f.propA === f.propB)
			ctx.addIssue({
				code: 'custom',
				path: ['propB'],
				message: 'Pick two different properties to fix the start state.'
			});
		else if (f.propA === 'fill' || f.propB === 'fill') {
			const other = f.propA === 'fill' ? f.propB : f.propA;
			const at: 'propA' | 'propB' = f.propA === 'fill' ? 'propB' : 'propA';
			if (other !== 'T' && other !== 'P')
				ctx.addIssue({
					code: 'custom',
					path: [at],
					message:
						'A liquid fill goes with a temperature or a pressure (where liquid and vapor are saturated), e.g. 80 % at 20 °C.'
				});
			if (f.size === 'flow')
				ctx.addIssue({
					code: 'custom',
					path: ['size'],
					message:
						'A liquid fill is for a closed vessel; a steady-flow device starts from two properties.'
				});
		}
		if (f.size !== 'perkg' && !f.sizeValue)
			ctx.addIssue({
				code: 'custom',
				path: ['sizeValue'],
				message:
					f.size === 'flow'
						? 'Enter the mass flow, e.g. 0.5 kg/s.'
						: f.size === 'mass'
							? 'Enter the mass, e.g. 12 kg.'
							: 'Enter the volume, e.g. 0.5 m³.'
			});
	});

const ECHO = [
	'title',
	'fluid',
	'size',
	'sizeValue',
	'propA',
	'valueA',
	'propB',
	'valueB',
	'unitSystem',
	'pressureUnit',
	'pressureReference',
	'atmosphere'
];

export const actions: Actions = {
	example: async (event) => {
		const access = await requireTeam(event, event.params.team, 'sheet:edit');
		const parsed = parseForm(
			z.object({
				example: plainText('The worked example', 'line', 'Pick a worked example.'),
				title: plainText('The title').optional()
			}),
			await readFormData(event.request),
			['example']
		);
		if (!parsed.ok) return parsed.failure;
		const r = await runAction(parsed.values, () =>
			createFromExample(getDb(), access, parsed.data.example, parsed.data.title)
		);
		if ('id' in r) redirect(303, `/t/${access.team.slug}/sheets/${r.id}`);
		return r;
	},

	blank: async (event) => {
		const access = await requireTeam(event, event.params.team, 'sheet:edit');
		const parsed = parseForm(blankForm, await readFormData(event.request), ECHO);
		if (!parsed.ok) return parsed.failure;
		const f = parsed.data;
		const errors: Record<string, string> = {};
		const prefs = unitPrefs({
			system: f.unitSystem,
			pressureUnit: f.pressureUnit,
			pressureReference: f.pressureReference
		});
		if (f.atmosphere) {
			const atm = parseQuantity(f.atmosphere, 'pressure', {
				defaultUnit: f.unitSystem === 'us' ? 'psi_a' : 'kPa_a'
			});
			if (!atm.ok) errors.atmosphere = atm.error.message;
			else if (atm.unit.reference === 'gauge')
				errors.atmosphere =
					'Give the atmospheric pressure as an absolute pressure, e.g. 98.5 kPa a.';
			else if (atm.si < 20_000 || atm.si > 120_000)
				errors.atmosphere =
					'Give an atmospheric pressure from 20 to 120 kPa a (101.325 kPa a at sea level).';
			else prefs.atmosphere = atm.si;
		}
		const read = (field: 'valueA' | 'valueB', prop: (typeof PROPS)[number], value: string) => {
			// a fill reads "80" as 80 %; elsewhere a bare number needs its unit
			const typed = prop === 'fill' && /^\s*[\d.]+\s*$/.test(value) ? `${value.trim()} %` : value;
			const r = parseQuantity(typed, QUANTITY[prop], {
				atmosphere: prefs.atmosphere,
				bareReference: prefs.pressureReference
			});
			if (!r.ok) {
				// 40 °C given for P: the saturation pressure at 40 °C (and a pressure for T likewise)
				const sat =
					r.error.code === 'wrong-quantity' && (prop === 'T' || prop === 'P')
						? readAcrossSaturation(engine, f.fluid, prop, value, prefs)
						: null;
				if (sat?.ok) return sat.si;
				errors[field] = sat
					? sat.message
					: prop === 'fill'
						? `Liquid fill: ${r.error.message}`
						: r.error.message;
				return NaN;
			}
			return r.si;
		};
		const a = read('valueA', f.propA, f.valueA);
		const b = read('valueB', f.propB, f.valueB);
		let system: PathSystem = { kind: 'closed' };
		if (f.size !== 'perkg') {
			const q: Quantity = f.size === 'flow' ? 'massFlow' : f.size === 'mass' ? 'mass' : 'volume';
			const r = parseQuantity(f.sizeValue ?? '', q, {});
			if (!r.ok) errors.sizeValue = r.error.message;
			else
				system =
					f.size === 'flow'
						? { kind: 'flow', massFlow: r.si }
						: f.size === 'mass'
							? { kind: 'closed', mass: r.si }
							: { kind: 'closed', volume: r.si };
		}
		if (Object.keys(errors).length) {
			const list = Object.values(errors);
			return formFailure(
				400,
				list.length === 1 ? list[0] : 'Some fields need attention: see the notes beside them.',
				errors,
				parsed.values
			);
		}
		let start: Record<string, number> = { [f.propA]: a, [f.propB]: b };
		let startSpec: StartSpec | undefined;
		if (f.propA === 'fill' || f.propB === 'fill') {
			const [fraction, otherProp, otherValue] =
				f.propA === 'fill' ? [a, f.propB, b] : [b, f.propA, a];
			startSpec = {
				kind: 'fill',
				fraction,
				...(otherProp === 'T' ? { T: otherValue } : { P: otherValue })
			};
			try {
				start = fillStart(engine, f.fluid, startSpec);
			} catch (e) {
				const field = f.propA === 'fill' ? 'valueB' : 'valueA';
				return formFailure(
					400,
					`No fill level there: ${(e as Error).message}`,
					{ [field]: `No fill level there: ${(e as Error).message}` },
					parsed.values
				);
			}
		}
		const doc = makeDoc({ spec: { fluid: f.fluid, system, start, legs: [] }, units: prefs });
		if (startSpec) doc.startSpec = startSpec;
		const r = await runAction(parsed.values, () =>
			createSheet(getDb(), access, { title: f.title, doc })
		);
		if ('id' in r) redirect(303, `/t/${access.team.slug}/sheets/${r.id}`);
		// the engine's reason belongs beside the start state's fields
		if (r.data.errors.start) r.data.errors = { ...r.data.errors, valueB: r.data.errors.start };
		return r;
	}
};
