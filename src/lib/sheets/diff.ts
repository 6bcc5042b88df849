/**
 * What differs between two sheet documents, as rows a person can read: the start state, each leg
 * (matched by its id, so a reordered or renamed-process leg is recognised), the system, limits,
 * units and title block. Values are formatted in the display units of `prefs`. Used when an
 * autosave is refused because someone else saved in between (and by revision compares later).
 */
import { formatQuantity, PROPERTY_QUANTITY, type UnitPrefs } from '$lib/units';
import {
	DESIGN_LIMIT_LABEL,
	DESIGN_LIMIT_NAMES,
	DESIGN_LIMIT_QUANTITY,
	FORMULATION_NAME,
	type Inputs,
	type TargetName
} from '$lib/thermo/types';
import { legLabel, TITLE_BLOCK_LABELS } from './doc';
import type { SheetDoc, SheetLegSpec } from './types';
import { fillText } from './fill';

export interface DiffRow {
	/** where: "Start state", "Leg L2", "Design limits", … */
	section: string;
	/** what: "T", "process", "target", "design pressure", … */
	field: string;
	/** display text in each document ('' when absent) */
	a: string;
	b: string;
}

function prop(name: TargetName, si: number | undefined, prefs: UnitPrefs): string {
	if (si === undefined) return '';
	return `${name} = ${formatQuantity(si, PROPERTY_QUANTITY[name], prefs).full}`;
}

function inputsText(i: Inputs | Partial<Record<TargetName, number>>, prefs: UnitPrefs): string {
	return (Object.entries(i) as [TargetName, number | undefined][])
		.filter(([, v]) => v !== undefined)
		.map(([k, v]) => prop(k, v, prefs))
		.join(', ');
}

function legText(
	l: SheetLegSpec | undefined,
	prefs: UnitPrefs
): { process: string; target: string } {
	if (!l) return { process: '', target: '' };
	return {
		process: l.process + (l.n !== undefined ? ` (n = ${l.n})` : ''),
		target:
			l.to === 'saturation'
				? `saturation (${l.target.x === 0 ? 'liquid' : 'vapor'} line)`
				: inputsText(l.target, prefs)
	};
}

function systemText(d: SheetDoc, prefs: UnitPrefs): string {
	const s = d.spec.system;
	if (s.kind === 'flow')
		return `steady flow, ${formatQuantity(s.massFlow, 'massFlow', prefs).full}`;
	if (s.mass !== undefined) return `closed, ${formatQuantity(s.mass, 'mass', prefs).full}`;
	if (s.volume !== undefined) return `closed, ${formatQuantity(s.volume, 'volume', prefs).full}`;
	return 'closed, per kg';
}

const LIMITS = DESIGN_LIMIT_NAMES.map(
	(k) => [k, DESIGN_LIMIT_LABEL[k], DESIGN_LIMIT_QUANTITY[k]] as const
);

/** Rows where `a` and `b` differ; values shown in `prefs` (usually the reader's sheet units). */
export function diffDocs(a: SheetDoc, b: SheetDoc, prefs: UnitPrefs = a.units): DiffRow[] {
	const rows: DiffRow[] = [];
	const add = (section: string, field: string, x: string, y: string) => {
		if (x !== y) rows.push({ section, field, a: x, b: y });
	};
	add('Sheet', 'fluid', a.spec.fluid, b.spec.fluid);
	const formulation = (d: SheetDoc) =>
		d.spec.fluid === 'water' ? FORMULATION_NAME[d.spec.formulation ?? 'iapws95'] : '';
	add('Sheet', 'formulation', formulation(a), formulation(b));
	add('Sheet', 'system', systemText(a, prefs), systemText(b, prefs));
	add('Sheet', 'description', a.description, b.description);
	const startText = (d: SheetDoc) =>
		d.startSpec?.kind === 'fill' ? fillText(d.startSpec, prefs) : inputsText(d.spec.start, prefs);
	add('Start state S1', 'fixed by', startText(a), startText(b));

	const ids = [...new Set([...a.spec.legs.map((l) => l.id), ...b.spec.legs.map((l) => l.id)])];
	for (const id of ids) {
		const ia = a.spec.legs.findIndex((l) => l.id === id);
		const ib = b.spec.legs.findIndex((l) => l.id === id);
		const name =
			ia >= 0 && ib >= 0 && ia !== ib
				? `Leg ${legLabel(ia)} → ${legLabel(ib)}`
				: `Leg ${legLabel(ia >= 0 ? ia : ib)}`;
		const la = legText(a.spec.legs[ia], prefs);
		const lb = legText(b.spec.legs[ib], prefs);
		if (ia < 0 || ib < 0) {
			add(
				name,
				ia < 0 ? 'added' : 'deleted',
				ia < 0 ? '' : `${la.process} to ${la.target}`,
				ib < 0 ? '' : `${lb.process} to ${lb.target}`
			);
			continue;
		}
		if (ia !== ib) add(name, 'position', legLabel(ia), legLabel(ib));
		add(name, 'process', la.process, lb.process);
		add(name, 'target', la.target, lb.target);
	}

	for (const [key, label, q] of LIMITS) {
		const x = a.spec.limits?.[key];
		const y = b.spec.limits?.[key];
		add(
			'Design limits',
			label,
			x === undefined ? '' : formatQuantity(x, q, prefs).full,
			y === undefined ? '' : formatQuantity(y, q, prefs).full
		);
	}
	const unitsText = (u: UnitPrefs) =>
		`${u.system === 'si' ? 'SI' : 'US customary'}, ${u.system === 'si' ? u.pressureUnit : 'psi'} ${u.pressureReference}`;
	add('Units', 'display', unitsText(a.units), unitsText(b.units));
	add(
		'Units',
		'atmospheric pressure',
		formatQuantity(a.units.atmosphere, 'pressure', prefs, { reference: 'absolute' }).full,
		formatQuantity(b.units.atmosphere, 'pressure', prefs, { reference: 'absolute' }).full
	);
	for (const k of Object.keys(TITLE_BLOCK_LABELS) as (keyof typeof TITLE_BLOCK_LABELS)[])
		add('Title block', TITLE_BLOCK_LABELS[k], a.titleBlock[k], b.titleBlock[k]);
	return rows;
}
