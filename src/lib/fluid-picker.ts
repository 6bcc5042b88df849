/**
 * Finding a fluid by what an engineer types — its name, formula, R-number or another alias
 * ("R-290", "LNG", "O2", "LH2", "1234yf") — and grouping the list by use. Pure functions over the
 * fluid metadata the API lists (FluidInfo); used by FluidPicker.svelte on the new-sheet and sheet pages.
 */

/** The metadata the picker needs (a subset of FluidInfo). */
export interface PickableFluid {
	id: string;
	name: string;
	formula: string;
	aliases: string[];
	group: 'water' | 'refrigerant' | 'hydrocarbon' | 'cryogen';
}

/** Groups in display order with their labels (the same as the engine's FLUID_GROUPS). */
export const PICKER_GROUPS: { id: PickableFluid['group']; label: string }[] = [
	{ id: 'water', label: 'Water and steam' },
	{ id: 'refrigerant', label: 'Refrigerants' },
	{ id: 'hydrocarbon', label: 'Hydrocarbons' },
	{ id: 'cryogen', label: 'Cryogens and gases' }
];

/** Lower case without spaces, hyphens, dots, commas, parentheses or subscripts: "R-1234ze(E)" → "r1234zee", "O₂" → "o2". */
export function normalize(text: string): string {
	return text
		.normalize('NFKD')
		.toLowerCase()
		.replace(/[\s\-–_.,()[\]/'’]/g, '');
}

/** How well a fluid answers a query: 3 exact, 2 prefix, 1 contains, 0 not at all (best over its names). */
export function matchRank(f: PickableFluid, query: string): number {
	const q = normalize(query);
	if (q === '') return 1;
	let best = 0;
	for (const term of [f.id, f.name, f.formula, ...f.aliases]) {
		const t = normalize(term);
		if (t === q) return 3;
		if (t.startsWith(q)) best = Math.max(best, 2);
		else if (t.includes(q)) best = Math.max(best, 1);
	}
	return best;
}

/** The fluids that answer a query, best first (the listed order among equals). An empty query lists all. */
export function searchFluids<F extends PickableFluid>(fluids: F[], query: string): F[] {
	return fluids
		.map((f, k) => ({ f, k, r: matchRank(f, query) }))
		.filter((m) => m.r > 0)
		.sort((a, b) => b.r - a.r || a.k - b.k)
		.map((m) => m.f);
}

/** Fluids by group, groups in display order, empty groups left out; each group keeps the given order. */
export function groupFluids<F extends PickableFluid>(
	fluids: F[]
): { id: PickableFluid['group']; label: string; fluids: F[] }[] {
	return PICKER_GROUPS.map((g) => ({
		...g,
		fluids: fluids.filter((f) => f.group === g.id)
	})).filter((g) => g.fluids.length > 0);
}

/**
 * Fluids engineers ask for that Statewright does not carry (yet): a query naming one exactly is
 * told so, rather than only shown near matches (He would otherwise offer methane, whose name contains it).
 */
const NOT_CARRIED: { label: string; names: string[] }[] = [
	{ label: 'Helium', names: ['helium', 'he', 'he4', 'helium4', 'lhe', 'r704', 'liquid helium'] }
];

/** The fluid a query names exactly when Statewright does not carry it, else null. */
export function notCarried(query: string): string | null {
	const q = normalize(query);
	return NOT_CARRIED.find((f) => f.names.some((n) => normalize(n) === q))?.label ?? null;
}
