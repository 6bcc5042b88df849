import type { SheetDoc } from '$lib/sheets/types';
import {
	DESIGN_LIMIT_LABEL,
	DESIGN_LIMIT_NAMES,
	DESIGN_LIMIT_QUANTITY,
	type PathLeg,
	type PathResult,
	type PathState,
	type TargetName
} from '$lib/thermo/types';
import { PROPERTY_QUANTITY, type Quantity } from '$lib/units';

/**
 * What changed between two revisions of a sheet (or a revision and a draft): the spec's fields,
 * each state's properties and each leg's q and w, with differences. Pure and keyed by stable ids —
 * legs by their id, states by their anchor ('start', or the id of the leg the state ends) — so an
 * inserted or removed leg shows as added or removed rather than shifting every row after it.
 * Everything is SI; the view formats (see format.ts).
 */

export interface DiffSide {
	/** "Rev 1", "Working draft" */
	label: string;
	doc: SheetDoc;
	/** null when the spec could not be computed (a draft can be in that state) */
	result: PathResult | null;
}

export type ChangeStatus = 'added' | 'removed' | 'changed' | 'unchanged';

/** One compared value. Numbers are SI; text values (process, phase, fluid) have no delta. */
export interface ValueChange {
	key: string;
	label: string;
	/** how to format numbers; null for text */
	quantity: Quantity | null;
	before: number | string | null;
	after: number | string | null;
	/** after − before (SI; for temperatures a difference in K), when both are numbers */
	delta: number | null;
	changed: boolean;
}

export interface LegDiff {
	id: string;
	status: ChangeStatus;
	/** position labels on each side ("L2"), null where the leg does not exist */
	before: string | null;
	after: string | null;
	/** process, target, n */
	spec: ValueChange[];
	/** q, w (closed) or q, w shaft (flow) per kg; Δs; totals */
	energy: ValueChange[];
}

export interface StateDiff {
	/** 'start' or the id of the leg the state ends */
	anchor: string;
	status: ChangeStatus;
	before: string | null;
	after: string | null;
	props: ValueChange[];
}

export interface RevisionDiff {
	before: string;
	after: string;
	/** fluid, system, start inputs, design limits, atmosphere */
	spec: ValueChange[];
	legs: LegDiff[];
	states: StateDiff[];
	/** description, title-block fields, units and chart preferences */
	presentation: ValueChange[];
	summary: {
		spec: number;
		legsAdded: number;
		legsRemoved: number;
		legsChanged: number;
		statesChanged: number;
		presentation: number;
	};
}

/** Relative tolerance below which two computed numbers count as equal (round-off across runs). */
export const DIFF_TOLERANCE = 1e-9;

export function sameNumber(a: number, b: number): boolean {
	if (a === b) return true;
	const scale = Math.max(Math.abs(a), Math.abs(b));
	return Math.abs(a - b) <= DIFF_TOLERANCE * scale + 1e-12;
}

function change(
	key: string,
	label: string,
	quantity: Quantity | null,
	before: number | string | null | undefined,
	after: number | string | null | undefined
): ValueChange {
	const b = before ?? null;
	const a = after ?? null;
	const numeric = typeof b === 'number' && typeof a === 'number';
	const changed = numeric ? !sameNumber(b, a) : b !== a;
	return { key, label, quantity, before: b, after: a, delta: numeric ? a - b : null, changed };
}

const INPUT_NAMES = ['T', 'P', 'v', 'rho', 'u', 'h', 's', 'x'] as const;

const LIMITS = DESIGN_LIMIT_NAMES.map(
	(k) => [k, DESIGN_LIMIT_LABEL[k], DESIGN_LIMIT_QUANTITY[k]] as const
);

function specChanges(a: SheetDoc, b: SheetDoc): ValueChange[] {
	const out: ValueChange[] = [];
	const sa = a.spec;
	const sb = b.spec;
	out.push(change('fluid', 'fluid', null, sa.fluid, sb.fluid));
	out.push(
		change(
			'system.kind',
			'system',
			null,
			sa.system.kind === 'flow' ? 'steady-flow device' : 'closed system',
			sb.system.kind === 'flow' ? 'steady-flow device' : 'closed system'
		)
	);
	const sys = (d: SheetDoc, k: 'mass' | 'volume' | 'massFlow') =>
		(d.spec.system as Record<string, unknown>)[k] as number | undefined;
	out.push(change('system.mass', 'mass', 'mass', sys(a, 'mass'), sys(b, 'mass')));
	out.push(change('system.volume', 'volume', 'volume', sys(a, 'volume'), sys(b, 'volume')));
	out.push(
		change('system.massFlow', 'mass flow', 'massFlow', sys(a, 'massFlow'), sys(b, 'massFlow'))
	);
	for (const n of INPUT_NAMES)
		out.push(change(`start.${n}`, `start ${n}`, PROPERTY_QUANTITY[n], sa.start[n], sb.start[n]));
	for (const [k, label, q] of LIMITS)
		out.push(change(`limits.${k}`, label, q, sa.limits?.[k], sb.limits?.[k]));
	out.push(
		change(
			'atmosphericPressure',
			'atmospheric pressure',
			'pressure',
			sa.atmosphericPressure ?? a.units.atmosphere,
			sb.atmosphericPressure ?? b.units.atmosphere
		)
	);
	// leave out fields absent on both sides
	return out.filter((c) => c.before !== null || c.after !== null);
}

function presentationChanges(a: SheetDoc, b: SheetDoc): ValueChange[] {
	const out: ValueChange[] = [
		change('description', 'description', null, a.description, b.description)
	];
	for (const k of ['project', 'equipment', 'tag', 'documentNumber', 'site'] as const) {
		const label = {
			project: 'project',
			equipment: 'equipment',
			tag: 'tag',
			documentNumber: 'document number',
			site: 'site'
		}[k];
		out.push(change(`titleBlock.${k}`, label, null, a.titleBlock[k], b.titleBlock[k]));
	}
	out.push(change('units.system', 'unit system', null, a.units.system, b.units.system));
	out.push(
		change('units.pressureUnit', 'pressure unit', null, a.units.pressureUnit, b.units.pressureUnit)
	);
	out.push(
		change(
			'units.pressureReference',
			'pressures shown as',
			null,
			a.units.pressureReference,
			b.units.pressureReference
		)
	);
	out.push(change('chart.view', 'chart view', null, a.chart.view, b.chart.view));
	out.push(
		change(
			'chart.lines',
			'background lines',
			null,
			a.chart.lines?.join(', ') ?? 'each view’s own',
			b.chart.lines?.join(', ') ?? 'each view’s own'
		)
	);
	out.push(
		change(
			'chart.pressureScale',
			'pressure axis',
			null,
			a.chart.pressureScale,
			b.chart.pressureScale
		)
	);
	return out.filter((c) => c.changed);
}

function targetOf(t: Partial<Record<TargetName, number>>): {
	name: string | null;
	value: number | null;
} {
	const name = (Object.keys(t) as TargetName[]).find((k) => t[k] !== undefined) ?? null;
	return { name, value: name ? (t[name] as number) : null };
}

/** Leg ids in display order: the later side's order, removed legs placed after their predecessor. */
export function mergedLegOrder(before: readonly string[], after: readonly string[]): string[] {
	const order = [...after];
	const present = new Set(after);
	for (let i = 0; i < before.length; i++) {
		const id = before[i];
		if (present.has(id)) continue;
		let at = 0;
		for (let j = i - 1; j >= 0; j--) {
			const k = order.indexOf(before[j]);
			if (k >= 0) {
				at = k + 1;
				break;
			}
		}
		order.splice(at, 0, id);
		present.add(id);
	}
	return order;
}

function stateAt(result: PathResult | null, anchor: string): PathState | null {
	if (!result) return null;
	if (anchor === 'start') return result.states[0] ?? null;
	const leg = result.legs.find((l) => l.id === anchor);
	return leg ? (result.states.find((s) => s.id === leg.to) ?? null) : null;
}

function legAt(result: PathResult | null, id: string): PathLeg | null {
	return result?.legs.find((l) => l.id === id) ?? null;
}

function statusOf(inBefore: boolean, inAfter: boolean, changes: ValueChange[]): ChangeStatus {
	if (!inBefore) return 'added';
	if (!inAfter) return 'removed';
	return changes.some((c) => c.changed) ? 'changed' : 'unchanged';
}

export function diffRevisions(before: DiffSide, after: DiffSide): RevisionDiff {
	const legsA = before.doc.spec.legs;
	const legsB = after.doc.spec.legs;
	const order = mergedLegOrder(
		legsA.map((l) => l.id),
		legsB.map((l) => l.id)
	);
	const flowA = before.doc.spec.system.kind === 'flow';
	const flowB = after.doc.spec.system.kind === 'flow';

	const legs: LegDiff[] = order.map((id) => {
		const ia = legsA.findIndex((l) => l.id === id);
		const ib = legsB.findIndex((l) => l.id === id);
		const sa = ia >= 0 ? legsA[ia] : null;
		const sb = ib >= 0 ? legsB[ib] : null;
		const ta = sa ? targetOf(sa.target) : { name: null, value: null };
		const tb = sb ? targetOf(sb.target) : { name: null, value: null };
		const spec = [change('process', 'process', null, sa?.process, sb?.process)];
		const sameTarget = ta.name === tb.name;
		if (sameTarget && ta.name)
			spec.push(
				change(
					`target.${ta.name}`,
					`target ${ta.name}`,
					PROPERTY_QUANTITY[ta.name as TargetName],
					ta.value,
					tb.value
				)
			);
		else {
			spec.push(change('target', 'target property', null, ta.name, tb.name));
			if (ta.name)
				spec.push(
					change(
						`target.${ta.name}`,
						`target ${ta.name}`,
						PROPERTY_QUANTITY[ta.name as TargetName],
						ta.value,
						null
					)
				);
			if (tb.name)
				spec.push(
					change(
						`target.${tb.name}`,
						`target ${tb.name}`,
						PROPERTY_QUANTITY[tb.name as TargetName],
						null,
						tb.value
					)
				);
		}
		if (sa?.process === 'polytropic' || sb?.process === 'polytropic')
			spec.push(change('n', 'n', null, sa?.n ?? null, sb?.n ?? null));
		const la = legAt(before.result, id);
		const lb = legAt(after.result, id);
		const energyUnit: Quantity = flowB || (!sb && flowA) ? 'power' : 'energy';
		const energy = [
			change(
				'q',
				'q',
				'specificEnergy',
				la ? (flowA ? la.leg.qFlow : la.leg.q) : null,
				lb ? (flowB ? lb.leg.qFlow : lb.leg.q) : null
			),
			change(
				'w',
				flowB ? 'w shaft' : 'w',
				'specificEnergy',
				la ? (flowA ? la.leg.wShaft : la.leg.w) : null,
				lb ? (flowB ? lb.leg.wShaft : lb.leg.w) : null
			),
			change('ds', 'Δs', 'specificEntropy', la?.leg.ds ?? null, lb?.leg.ds ?? null),
			change(
				'Q',
				flowB ? 'Q̇' : 'Q',
				energyUnit,
				la ? (flowA ? la.totals.QFlow : la.totals.Q) : null,
				lb ? (flowB ? lb.totals.QFlow : lb.totals.Q) : null
			),
			change(
				'W',
				flowB ? 'Ẇ shaft' : 'W',
				energyUnit,
				la ? (flowA ? la.totals.WShaft : la.totals.W) : null,
				lb ? (flowB ? lb.totals.WShaft : lb.totals.W) : null
			)
		];
		return {
			id,
			status: statusOf(ia >= 0, ib >= 0, [...spec, ...energy]),
			before: ia >= 0 ? `L${ia + 1}` : null,
			after: ib >= 0 ? `L${ib + 1}` : null,
			spec,
			energy
		};
	});

	const anchors = ['start', ...order];
	const states: StateDiff[] = anchors.map((anchor) => {
		const inA = anchor === 'start' || legsA.some((l) => l.id === anchor);
		const inB = anchor === 'start' || legsB.some((l) => l.id === anchor);
		const pa = stateAt(before.result, anchor);
		const pb = stateAt(after.result, anchor);
		const ia = anchor === 'start' ? 0 : legsA.findIndex((l) => l.id === anchor) + 1;
		const ib = anchor === 'start' ? 0 : legsB.findIndex((l) => l.id === anchor) + 1;
		const props = [
			change('phase', 'phase', null, pa?.state.phase, pb?.state.phase),
			change('T', 'T', 'temperature', pa?.state.T, pb?.state.T),
			change('P', 'P', 'pressure', pa?.state.P, pb?.state.P),
			change('v', 'v', 'specificVolume', pa?.state.v, pb?.state.v),
			change('u', 'u', 'specificEnergy', pa?.state.u, pb?.state.u),
			change('h', 'h', 'specificEnergy', pa?.state.h, pb?.state.h),
			change('s', 's', 'specificEntropy', pa?.state.s, pb?.state.s),
			change('x', 'x', 'quality', pa?.state.x, pb?.state.x)
		];
		return {
			anchor,
			status: statusOf(inA, inB, props),
			before: inA ? `S${ia + 1}` : null,
			after: inB ? `S${ib + 1}` : null,
			props
		};
	});

	const spec = specChanges(before.doc, after.doc);
	const presentation = presentationChanges(before.doc, after.doc);
	return {
		before: before.label,
		after: after.label,
		spec,
		legs,
		states,
		presentation,
		summary: {
			spec: spec.filter((c) => c.changed).length,
			legsAdded: legs.filter((l) => l.status === 'added').length,
			legsRemoved: legs.filter((l) => l.status === 'removed').length,
			legsChanged: legs.filter((l) => l.status === 'changed').length,
			statesChanged: states.filter((s) => s.status !== 'unchanged').length,
			presentation: presentation.length
		}
	};
}

/** True when nothing at all differs. */
export function isEmptyDiff(d: RevisionDiff): boolean {
	const s = d.summary;
	return (
		s.spec + s.legsAdded + s.legsRemoved + s.legsChanged + s.statesChanged + s.presentation === 0
	);
}
