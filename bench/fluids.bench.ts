/**
 * Per-fluid engine benchmark: median CPU µs per call for (T, ρ), (P, T), (P, h) and saturation at T,
 * for every registered fluid (or those named: `npx tsx bench/fluids.bench.ts propane argon`, or
 * BENCH_FLUIDS=propane,argon), against the current budgets for every fluid (docs/performance.md's
 * performance budget; the same numbers as engine.bench.ts). Prints a table; never fails on time.
 *
 * States per fluid: single-phase points at six temperatures between the triple point and 1.6× the
 * critical temperature at 0.2, 1 and 3 times the critical density, plus mixtures at x = 0.1 and 0.6
 * (inputs precomputed). Six temperatures rather than four since 3 December 2026: the engine keeps
 * its last two evaluations (Fluid.residualAt), and a fluid with only two states in range (R-1234ze(E)
 * had) would have been timed on answers it already held.
 * Air (a mixture, pseudo-pure.ts) has no two-phase states: its bubble (x = 0) and dew (x = 1)
 * points stand in for the mixtures, and its "sat at T" column is the bubble point at T.
 */
import { loadavg } from 'node:os';
import { fixState, listFluids, saturationAtT } from '../src/lib/thermo/index.ts';
import type { FluidInfo, Inputs, State } from '../src/lib/thermo/types.ts';
import { fluidData } from '../src/lib/thermo/fluids/index.ts';

const isMixture = (id: string) => Boolean(fluidData.find((d) => d.id === id)?.band);

const BUDGETS = { 'T, rho': 1, 'P, T': 3, 'P, h': 10, 'sat at T': 5 } as const;
/**
 * The first budgets, which water's figures met when the ten fluids after the first five were added
 * (they were to meet the same): a second mark per figure, so both bars read off one run.
 */
const FIRST_BUDGETS = { 'T, rho': 2, 'P, T': 12, 'P, h': 40, 'sat at T': 20 } as const;

function median(xs: number[]): number {
	const s = [...xs].sort((a, b) => a - b);
	return s[s.length >> 1];
}

/** Median CPU µs per call over batches of ~0.5 ms, after a warm-up of at least 0.2 s. */
function time(calls: (() => unknown)[]): number {
	const n = calls.length;
	const w0 = performance.now();
	let warm = 0;
	while (warm < 3000 || performance.now() - w0 < 200) calls[warm++ % n]();
	const perCall = (performance.now() - w0) / warm;
	const per = Math.max(n, Math.ceil(0.5 / perCall / n) * n);
	const cpus: number[] = [];
	const deadline = performance.now() + 800;
	while (cpus.length < 11 || (performance.now() < deadline && cpus.length < 100)) {
		const c0 = process.cpuUsage();
		for (let k = 0; k < per; k++) calls[k % n]();
		const cu = process.cpuUsage(c0);
		cpus.push((cu.user + cu.system) / per);
	}
	return median(cpus);
}

function states(f: FluidInfo): { single: State[]; mixed: State[] } {
	const Tc = f.equationCritical.T;
	const rhoc = f.equationCritical.rho;
	const Tt = f.triple.T;
	const single: State[] = [];
	// distinct temperatures only: where Tmax lies below 1.3·Tc the last two would coincide
	const temperatures = new Set([
		Tt + 0.4 * (Tc - Tt),
		Tt + 0.6 * (Tc - Tt),
		Tt + 0.8 * (Tc - Tt),
		Math.min(1.1 * Tc, 0.5 * (Tc + f.limits.Tmax)),
		Math.min(1.3 * Tc, f.limits.Tmax),
		Math.min(1.6 * Tc, f.limits.Tmax)
	]);
	for (const T of temperatures) {
		for (const r of [0.2, 1, 3]) {
			try {
				const st = fixState(f.id, { T, rho: r * rhoc });
				if (st.x === null && st.P <= f.limits.Pmax) single.push(st);
			} catch {
				/* outside the range: skip */
			}
		}
	}
	const mixed = [0.3, 0.6, 0.9].flatMap((k) =>
		(isMixture(f.id) ? [0, 1] : [0.1, 0.6]).map((x) => fixState(f.id, { T: Tt + k * (Tc - Tt), x }))
	);
	return { single, mixed };
}

const wanted = [...process.argv.slice(2), ...(process.env.BENCH_FLUIDS ?? '').split(',')].filter(
	Boolean
);
const fluids = listFluids().filter((f) => wanted.length === 0 || wanted.includes(f.id));
const head = ['fluid', 'T, rho µs', 'P, T µs', 'P, h µs', 'sat at T µs'];
const lines: string[][] = [];
for (const f of fluids) {
	const { single, mixed } = states(f);
	const all = [...single, ...mixed];
	const call = (i: Inputs) => () => fixState(f.id, i);
	const Tc = f.equationCritical.T;
	const Tt = f.triple.T;
	const figures = {
		'T, rho': time(single.map((s) => call({ T: s.T, rho: s.rho }))),
		'P, T': time(single.map((s) => call({ T: s.T, P: s.P }))),
		'P, h': time(all.map((s) => call({ P: s.P, h: s.h }))),
		'sat at T': time(
			[0.2, 0.4, 0.6, 0.8, 0.95, 0.99].map((k) =>
				isMixture(f.id)
					? () => fixState(f.id, { T: Tt + k * (Tc - Tt), x: 0 })
					: () => saturationAtT(f.id, Tt + k * (Tc - Tt))
			)
		)
	};
	lines.push([
		f.id,
		...Object.entries(figures).map(([k, v]) => {
			const budget = BUDGETS[k as keyof typeof BUDGETS];
			const first = FIRST_BUDGETS[k as keyof typeof FIRST_BUDGETS];
			return `${v.toFixed(2)} / ${budget}${v <= budget ? ' ✓' : ' ✗'} (${first}${v <= first ? ' ✓' : ' ✗'})`;
		})
	]);
}
const widths = head.map((h, k) => Math.max(h.length, ...lines.map((l) => l[k].length)));
const fmtRow = (r: string[]) =>
	r.map((x, k) => (k === 0 ? x.padEnd(widths[k]) : x.padStart(widths[k]))).join('  ');
console.log(
	`Statewright per-fluid engine benchmark — node ${process.version}, ${new Date().toISOString()}, load average ${loadavg()
		.map((x) => x.toFixed(1))
		.join(' ')} (other work on the machine inflates every figure)`
);
console.log(fmtRow(head));
console.log(widths.map((w) => '─'.repeat(w)).join('  '));
for (const l of lines) console.log(fmtRow(l));
console.log(
	'Median CPU µs per call / budget µs (the current budgets for every fluid, docs/performance.md), and in brackets the first budgets (those water met when the other fluids came). Never fails on time.'
);
