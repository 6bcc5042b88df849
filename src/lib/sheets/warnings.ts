/**
 * The warnings shown under the state table, in the sheet's units and with legs and states named
 * by their labels: the brief's cautions first (code deferral, liquid-full), then design limits
 * met, then notes on how to read the numbers. Built from the engine's PathWarnings and
 * LimitEvents; where the engine's text is in SI (it always is), it is rewritten in display units.
 */
import { CAUTION_TITLE, LIQUID_FULL_CAUTION, PRESSURE_EQUIPMENT_CAUTION } from '$lib/cautions';
import type { ChartSelection } from '$lib/charts/types';
import {
	DESIGN_LIMIT_LABEL,
	type FluidInfo,
	type LimitEvent,
	type PathResult,
	type PathWarning,
	type State
} from '$lib/thermo/types';
import { displayUnit, formatQuantity, unitById, type UnitPrefs } from '$lib/units';
import { labelIds, legLabel, stateKey, stateLabel } from './doc';
import type { SheetLegSpec } from './types';

export interface SheetWarning {
	key: string;
	severity: 'caution' | 'warning' | 'info';
	/** short heading */
	title: string;
	text: string;
	/** what to select on the chart when the warning is clicked */
	target: ChartSelection | null;
	code: string;
}

function limitValue(ev: LimitEvent, prefs: UnitPrefs): string {
	return ev.limit.endsWith('Pressure')
		? formatQuantity(ev.value, 'pressure', prefs).full
		: formatQuantity(ev.value, 'temperature', prefs).full;
}

function at(s: State, prefs: UnitPrefs): string {
	return `${formatQuantity(s.T, 'temperature', prefs).full} and ${formatQuantity(s.P, 'pressure', prefs).full}`;
}

/** (∂P/∂T)ᵥ (Pa/K) in the sheet's pressure unit per temperature-difference unit, 3 significant figures. */
export function rateText(paPerK: number, prefs: UnitPrefs): string {
	const p = displayUnit(
		'pressure',
		{ ...prefs, pressureReference: 'absolute' },
		{ magnitude: paPerK }
	);
	const dT = unitById(prefs.system === 'us' ? 'dF' : 'dK');
	const value = p.fromSI(paPerK, 0) / dT.fromSI(1, 0);
	const unit = p.label.replace(/ ?a$/, '').replace(/^psia$/, 'psi');
	return `about ${Number(value.toPrecision(3))} ${unit} per ${dT.label}`;
}

export function sheetWarnings(
	result: PathResult,
	legs: readonly SheetLegSpec[],
	prefs: UnitPrefs,
	fluid: FluidInfo | null
): SheetWarning[] {
	const out: SheetWarning[] = [];
	const legIndex = (id: string | undefined | null) =>
		id ? legs.findIndex((l) => l.id === id) : -1;
	const legTarget = (id: string | undefined | null): ChartSelection | null =>
		id && legIndex(id) >= 0 ? { kind: 'leg', id } : null;
	const name = (id: string | undefined | null) => {
		const i = legIndex(id);
		return i >= 0 ? `${legLabel(i)} (${legs[i].process})` : 'A leg';
	};

	for (const w of result.warnings) {
		const i = legIndex(w.leg);
		switch (w.code) {
			case 'pressure-equipment-caution':
				out.push({
					key: w.code,
					code: w.code,
					severity: 'caution',
					title: CAUTION_TITLE,
					text: PRESSURE_EQUIPMENT_CAUTION,
					target: null
				});
				break;
			case 'liquid-full': {
				const where = w.at ? ` at ${at(w.at, prefs)}` : '';
				const rate =
					w.dPdT !== undefined && Number.isFinite(w.dPdT) && w.dPdT > 0
						? rateText(w.dPdT, prefs)
						: null;
				const what =
					w.onset === 'start'
						? `${name(w.leg)} heats a closed system that is liquid-full from the leg’s start (compressed liquid${where}), at constant volume.`
						: `${name(w.leg)} fills the closed system with liquid${where}. It crosses the saturated-liquid line toward the liquid side.`;
				out.push({
					key: `${w.code}:${w.leg}`,
					code: w.code,
					severity: 'caution',
					title: 'Liquid-full',
					text: `${what} ${LIQUID_FULL_CAUTION}${rate ? ` Here ${rate} at constant volume.` : ''}`,
					target: legTarget(w.leg)
				});
				break;
			}
			case 'liquid-full-ahead': {
				const end = i >= 0 ? result.states[i + 1]?.state : null;
				const rho = end ? formatQuantity(end.rho, 'density', prefs).full : null;
				const rhoc = fluid ? formatQuantity(fluid.critical.rho, 'density', prefs).full : null;
				out.push({
					key: `${w.code}:${w.leg}`,
					code: w.code,
					severity: 'info',
					title: 'Heading for liquid-full',
					text:
						rho && rhoc
							? `${name(w.leg)} heats a closed two-phase system whose mean density (${rho}) is above the critical density (${rhoc}): heated further, the liquid expands until the vessel is liquid-full, and then the pressure rises very fast.`
							: labelIds(w.message, legs),
					target: legTarget(w.leg)
				});
				break;
			}
			case 'design-pressure-reached':
			case 'design-pressure-exceeded':
			case 'relief-set-pressure-reached':
			case 'relief-set-pressure-exceeded':
			case 'design-temperature-reached':
			case 'design-temperature-exceeded':
			case 'below-minimum-temperature':
				// written from the limit events below, in display units
				break;
			case 'relief-set-above-design-pressure': {
				const l = result.limits;
				out.push({
					key: w.code,
					code: w.code,
					severity: 'warning',
					title: 'Relief set above design pressure',
					text: `The relief set pressure (${formatQuantity(l.reliefSetPressure!, 'pressure', prefs).full}) is above the design pressure (${formatQuantity(l.designPressure!, 'pressure', prefs).full}). Set pressures and allowable overpressure are governed by the applicable code: check them there.`,
					target: null
				});
				break;
			}
			default:
				out.push(fromEngine(w, legs));
		}
	}

	for (const ev of result.limitEvents) {
		const label = DESIGN_LIMIT_LABEL[ev.limit];
		const value = limitValue(ev, prefs);
		const below = ev.limit === 'minimumTemperature';
		const verb = ev.exceeded ? (below ? 'goes below' : 'goes beyond') : 'reaches';
		const text = ev.leg
			? `${name(ev.leg)} ${ev.exceeded ? 'reaches and ' + verb : 'reaches'} the ${label} (${value}), first at ${at(ev.state, prefs)}.`
			: `The start S1 is already ${ev.exceeded ? (below ? 'below' : 'beyond') : 'at'} the ${label} (${value}).`;
		out.push({
			key: `limit:${ev.limit}:${ev.leg ?? 'start'}`,
			code: `limit-${ev.limit}`,
			severity: 'warning',
			title: `${label[0].toUpperCase()}${label.slice(1)} ${ev.exceeded ? (below ? 'undercut' : 'exceeded') : 'reached'}`,
			text: below ? `${text} Materials must be rated for it.` : text,
			target: ev.leg ? legTarget(ev.leg) : { kind: 'state', id: 'start' }
		});
	}

	const rank = { caution: 0, warning: 1, info: 2 } as const;
	return out
		.map((w, i) => ({ w, i }))
		.sort((a, b) => rank[a.w.severity] - rank[b.w.severity] || a.i - b.i)
		.map(({ w }) => w);
}

function fromEngine(w: PathWarning, legs: readonly SheetLegSpec[]): SheetWarning {
	const titles: Record<string, string> = {
		'throttling-irreversible': 'Throttling is irreversible',
		'per-kg-totals': 'Totals per kilogram',
		'if97-state-unavailable': 'A state IAPWS-IF97 cannot give'
	};
	const i = w.leg ? legs.findIndex((l) => l.id === w.leg) : -1;
	const title = titles[w.code] ?? w.code;
	// the engine's message may open with the same words as the title ("Leg L3: Throttling is
	// irreversible: …"); shown under the title they would be said twice
	const text = labelIds(w.message, legs).replace(
		/^((?:Leg \S+: )?)(.*?): /,
		(all, leg: string, head: string) => (head === title ? leg : all)
	);
	return {
		key: `${w.code}:${w.leg ?? ''}`,
		code: w.code,
		severity: w.severity,
		title,
		text,
		target:
			i >= 0
				? { kind: 'leg', id: w.leg! }
				: w.state
					? { kind: 'state', id: stateKey(legs, Number(w.state.slice(1)) - 1) }
					: null
	};
}

/** "S3" for the state a warning's `state` names (engine ids are positional). */
export function stateName(id: string): string {
	const n = Number(id.replace(/^S/, ''));
	return Number.isFinite(n) ? stateLabel(n - 1) : id;
}
