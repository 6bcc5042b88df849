import type { SignOff } from '$lib/revisions/sign-off';
import type { SheetDoc, SheetStatus } from '$lib/sheets/types';
import { STATUS } from '$lib/revisions/steps';
import { displayUnit, formatQuantity, NBSP, type UnitPrefs } from '$lib/units';
import { FORMULATION_NAME } from '$lib/thermo/types';
import type { MemoTitle } from './memo';

/** The fluid facts the title block names (a FluidInfo from GET /api/v1/fluids fits). */
export interface TitleFluid {
	name: string;
	formula: string;
	formulation: { name: string; reference: string };
}

/** Who signed what, from the revision record (src/lib/revisions/sign-off.ts). */
export type TitleSignOff = SignOff;
export { signOffOverrides, type SignOffEvent } from '$lib/revisions/sign-off';

const SUBSCRIPT: Record<string, string> = {
	'0': '₀',
	'1': '₁',
	'2': '₂',
	'3': '₃',
	'4': '₄',
	'5': '₅',
	'6': '₆',
	'7': '₇',
	'8': '₈',
	'9': '₉'
};

/** "H2O" → "H₂O", "CO2" → "CO₂" (digits after a letter or bracket). */
export function chemical(formula: string): string {
	return formula.replace(/(?<=[A-Za-z)\]])(\d+)/g, (d) =>
		[...d].map((c) => SUBSCRIPT[c] ?? c).join('')
	);
}

/** A size as typed: 5 significant figures without trailing zeros ("0.5 m³", "12.25 kg"). */
function size(si: number, quantity: 'volume' | 'mass' | 'massFlow', prefs: UnitPrefs): string {
	const f = formatQuantity(si, quantity, prefs, { unit: displayUnit(quantity, prefs) });
	const text =
		f.text.includes('.') && !f.text.includes('×') ? f.text.replace(/\.?0+$/, '') : f.text;
	return `${text}${NBSP}${f.unit.label}`;
}

/** "Closed system, 0.5 m³", "Closed system, per kg", "Steady-flow device, 0.8 kg/s". */
export function systemText(doc: Pick<SheetDoc, 'spec'>, prefs: UnitPrefs): string {
	const s = doc.spec.system;
	if (s.kind === 'flow') return `Steady-flow device, ${size(s.massFlow, 'massFlow', prefs)}`;
	if (s.volume !== undefined) return `Closed system, ${size(s.volume, 'volume', prefs)}`;
	if (s.mass !== undefined) return `Closed system, ${size(s.mass, 'mass', prefs)}`;
	return 'Closed system, per kg';
}

/** "SI: T °C · P kPa g (atmosphere 101.33 kPa a) · v m³/kg · u, h kJ/kg · s kJ/(kg·K)". */
export function unitsText(prefs: UnitPrefs): string {
	const l = (q: Parameters<typeof displayUnit>[0]) => displayUnit(q, prefs).label;
	const p = l('pressure');
	const atm = formatQuantity(prefs.atmosphere, 'pressure', prefs, {
		reference: 'absolute',
		sig: 5
	}).full;
	const gauge = displayUnit('pressure', prefs).reference === 'gauge';
	return [
		prefs.system === 'si' ? 'SI' : 'US customary',
		`T ${l('temperature')}`,
		`P ${p}${gauge ? ` (atmosphere ${atm})` : ''}`,
		`v ${l('specificVolume')}`,
		`u, h, q, w ${l('specificEnergy')}`,
		`s ${l('specificEntropy')}`
	].join(' · ');
}

export interface TitleInput {
	sheetName: string;
	teamName?: string;
	doc: SheetDoc;
	fluid: TitleFluid;
	/** the revision shown, or null for the working draft */
	revision: { number: number; status: SheetStatus } | null;
	/** for the working draft: the revision it is based on */
	basedOn?: number | null;
	signOff: TitleSignOff;
	/** sign-off steps taken over open review notes (signOffOverrides) */
	overrides?: string[];
	issued: number;
}

/**
 * The formulation as the title block names it: its name when that already names authors and year
 * ("Span–Wagner (1996)"), else the name and the first clause of its reference
 * ("IAPWS-95 — IAPWS R6-95(2018)").
 */
export function shortFormulation(fluid: TitleFluid): string {
	const { name, reference } = fluid.formulation;
	if (/\(\d{4}\)/.test(name)) return name;
	const ref = reference.split(/[;,]/)[0].trim();
	return ref && ref !== name ? `${name} — ${ref}` : name;
}

/** The title block's formulation of a sheet: water's IAPWS-IF97 when the sheet chose it, else the fluid's own. */
export function sheetFormulation(doc: SheetDoc, fluid: TitleFluid): string {
	return doc.spec.formulation === 'if97'
		? `${FORMULATION_NAME.if97} — IAPWS R7-97(2012)`
		: shortFormulation(fluid);
}

export function revisionText(revision: TitleInput['revision'], basedOn?: number | null): string {
	if (revision) return `Rev ${revision.number}`;
	return basedOn ? `Working draft (after Rev ${basedOn})` : 'Working draft';
}

/** The memo title block for a sheet at a revision (or its working draft). */
export function memoTitle(input: TitleInput): MemoTitle {
	const { doc, fluid } = input;
	const tb = doc.titleBlock;
	return {
		sheet: input.sheetName,
		team: input.teamName,
		revision: revisionText(input.revision, input.basedOn),
		// a working draft is not issued: its status says so and its date is not called an issue date
		status: input.revision ? STATUS[input.revision.status].label : 'Working draft',
		dateLabel: input.revision ? 'Issued' : 'Date',
		fluid: `${fluid.name} (${chemical(fluid.formula)})`,
		formulation: sheetFormulation(doc, fluid),
		system: systemText(doc, doc.units),
		units: unitsText(doc.units),
		designer: input.signOff.designer,
		checker: input.signOff.checker,
		approver: input.signOff.approver,
		project: tb.project,
		equipment: tb.equipment,
		tag: tb.tag,
		documentNumber: tb.documentNumber,
		site: tb.site,
		overrides: input.overrides ?? [],
		issued: input.issued
	};
}
