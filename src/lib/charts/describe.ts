import { DESIGN_LIMIT_LABEL, PHASE_NAME, type Phase, type State } from '$lib/thermo/types';
import { formatQuantity, type UnitPrefs } from '$lib/units';
import { PROCESS_ORDER, processStyle } from './encoding';
import { VIEWS } from './views';
import type {
	ChartKind,
	ChartLeg,
	ChartState,
	DesignLimitName,
	DesignLimits,
	MeasuredTrace,
	NoteFlag
} from './types';

export function phaseName(phase: Phase): string {
	return PHASE_NAME[phase];
}

export const LIMIT_ORDER: readonly DesignLimitName[] = [
	'reliefSetPressure',
	'designPressure',
	'designTemperature',
	'minimumTemperature'
];

export function isPressureLimit(name: DesignLimitName): boolean {
	return name === 'designPressure' || name === 'reliefSetPressure';
}

/** Short property text for names and readouts: temperatures to 0.1, others 4 significant figures. */
export function shortT(T: number, prefs: UnitPrefs): string {
	return formatQuantity(T, 'temperature', prefs, { decimals: 1 }).full;
}
export function shortP(P: number, prefs: UnitPrefs): string {
	return formatQuantity(P, 'pressure', prefs, { sig: 4 }).full;
}
export function shortV(v: number, prefs: UnitPrefs): string {
	return formatQuantity(v, 'specificVolume', prefs, { sig: 4 }).full;
}

/** "superheated vapor, 180.0 °C, 1000 kPa a" (with quality inside the dome) */
export function stateSummary(s: State, prefs: UnitPrefs): string {
	const parts = [phaseName(s.phase), shortT(s.T, prefs), shortP(s.P, prefs)];
	if (s.x !== null && s.phase === 'saturated-mixture')
		parts.push(`quality ${formatQuantity(s.x, 'quality', prefs, { decimals: 3 }).full}`);
	return parts.join(', ');
}

/** Accessible name of a state disc: "State S2, superheated vapor, 180.0 °C, 1000 kPa a". */
export function stateAriaLabel(cs: ChartState, prefs: UnitPrefs): string {
	return `State ${cs.label}, ${stateSummary(cs.state, prefs)}`;
}

/** Accessible name of a leg: "Leg S1 to S2, isochoric, crosses the saturated-vapor line". */
export function legAriaLabel(leg: ChartLeg, states: readonly ChartState[]): string {
	const name = (id: string) => states.find((s) => s.id === id)?.label ?? id;
	const style = processStyle(leg.process);
	const n = leg.process === 'polytropic' && leg.n !== undefined ? ` with n = ${leg.n}` : '';
	const lines = [...new Set(leg.crossings.map((c) => c.line))];
	const crossings = lines.length
		? `, crosses the ${lines.join(' and ')} line${lines.length > 1 ? 's' : ''}`
		: '';
	return `Leg ${name(leg.from)} to ${name(leg.to)}, ${style.name}${n}${crossings}`;
}

export function limitText(name: DesignLimitName, value: number, prefs: UnitPrefs): string {
	return `${DESIGN_LIMIT_LABEL[name]} ${isPressureLimit(name) ? shortP(value, prefs) : shortT(value, prefs)}`;
}

export interface ChartSummaryInput {
	kind: ChartKind;
	fluidName?: string;
	critical?: State | null;
	/** what the dome's own data says of it (SaturationCurve.note: its formulation, where it stops) */
	domeNote?: string | null;
	states: readonly ChartState[];
	legs: readonly ChartLeg[];
	limits?: DesignLimits | null;
	/** open review notes flagged on the chart */
	flags?: readonly NoteFlag[] | null;
	/** measured traces and overlaid revisions drawn on the chart */
	traces?: readonly MeasuredTrace[] | null;
	prefs: UnitPrefs;
}

/** One-sentence summary for the SVG's aria-label. */
export function chartSummary(input: ChartSummaryInput): string {
	const what = `${VIEWS[input.kind].name} diagram${input.fluidName ? ` of ${input.fluidName}` : ''}`;
	const path = input.states.length
		? `${input.states.length} state${input.states.length === 1 ? '' : 's'} and ${input.legs.length} leg${input.legs.length === 1 ? '' : 's'}`
		: 'no path yet';
	return `${what}, with the vapor dome and ${path}.`;
}

/** Longer text for the SVG's <desc>: dome, each state, each leg, each limit. */
export function chartDescription(input: ChartSummaryInput): string {
	const lines: string[] = [];
	if (input.critical)
		lines.push(
			`Critical point at ${shortT(input.critical.T, input.prefs)} and ${shortP(input.critical.P, input.prefs)}.`
		);
	if (input.domeNote) lines.push(input.domeNote);
	for (const s of input.states) lines.push(`${stateAriaLabel(s, input.prefs)}.`);
	for (const l of input.legs) lines.push(`${legAriaLabel(l, input.states)}.`);
	const used = PROCESS_ORDER.filter((p) => input.legs.some((l) => l.process === p)).map(
		processStyle
	);
	if (used.length)
		lines.push(
			`Legs are drawn by process: ${used.map((s) => `${s.name} as a ${s.colourName} ${s.pattern} line`).join('; ')}.`
		);
	for (const [name, limit] of Object.entries(input.limits ?? {}) as [
		DesignLimitName,
		{ value: number } | null | undefined
	][]) {
		if (limit) lines.push(`Design limit: ${limitText(name, limit.value, input.prefs)}.`);
	}
	for (const t of input.traces ?? []) {
		if (!t.points.length) continue;
		const n = `${t.points.length} point${t.points.length === 1 ? '' : 's'}`;
		lines.push(
			t.kind === 'revision'
				? `Overlaid for comparison: ${t.label}, ${n}.`
				: `Measured trace ${t.label}: ${n}.`
		);
	}
	const flags = (input.flags ?? []).filter((f) => f.count > 0);
	if (flags.length)
		lines.push(
			`Open review notes flagged: ${flags.map((f) => `${f.count} on ${f.label}`).join(', ')}.`
		);
	return lines.join(' ');
}
