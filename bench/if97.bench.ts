/**
 * IAPWS-IF97 per sheet: median CPU µs of if97Fix per input pair (seeded with the IAPWS-95 state of
 * the same inputs, as a path does) beside fixState with IAPWS-95 for the same pair, and of a water
 * path computed with formulation 'if97' beside the same path with IAPWS-95 (the IF97 re-fix is
 * added on top of the IAPWS-95 path), and the IF97 re-fix of one 200-point leg's points and crossings
 * (if97LegPoints) per process beside the IAPWS-95 leg itself, against the 3 ms budget of a 200-point
 * leg. Prints figures; never fails on time. `npm run bench:if97`.
 */
import { loadavg } from 'node:os';
import { computePath, fixState, if97Fix } from '../src/lib/thermo/index.ts';
import { if97LegPoints, if97Path } from '../src/lib/thermo/if97/path.ts';
import type { Inputs, PathSpec } from '../src/lib/thermo/types.ts';

function median(xs: number[]): number {
	const s = [...xs].sort((a, b) => a - b);
	return s[s.length >> 1];
}

/** Median CPU µs per call over batches of ~2 ms, after a warm-up of at least 0.2 s. */
function time(call: () => unknown): number {
	const w0 = performance.now();
	let warm = 0;
	while (warm < 20 || performance.now() - w0 < 200) {
		call();
		warm++;
	}
	const per = Math.max(1, Math.ceil(2 / ((performance.now() - w0) / warm)));
	const cpus: number[] = [];
	const deadline = performance.now() + 1500;
	while (cpus.length < 7 || (performance.now() < deadline && cpus.length < 50)) {
		const c0 = process.cpuUsage();
		for (let k = 0; k < per; k++) call();
		const cu = process.cpuUsage(c0);
		cpus.push((cu.user + cu.system) / per);
	}
	return median(cpus);
}

const pairs: [string, Inputs][] = [
	['T, P (liquid)', { T: 350, P: 5e6 }],
	['P, h (vapor)', { P: 1e6, h: 3.0e6 }],
	['P, s (mixture)', { P: 1e5, s: 6e3 }],
	['T, x', { T: 450, x: 0.3 }],
	['T, v (liquid)', { T: 360, v: 0.00103 }],
	['P, v (vapor)', { P: 1e6, v: 0.25 }],
	['v, u (mixture)', { v: 0.1, u: 1.5e6 }],
	['h, s (vapor)', { h: 3.2e6, s: 7e3 }]
];

console.log(
	`if97Fix against fixState (IAPWS-95), median CPU µs per call; load average ${loadavg()
		.map((x) => x.toFixed(1))
		.join(' ')}`
);
console.log('pair                 IAPWS-95   IF97 (seeded)');
for (const [name, inputs] of pairs) {
	const seed = fixState('water', inputs);
	const t95 = time(() => fixState('water', inputs));
	const t97 = time(() => if97Fix(inputs, seed));
	console.log(`${name.padEnd(20)} ${t95.toFixed(1).padStart(8)}   ${t97.toFixed(1).padStart(8)}`);
}

const path: PathSpec = {
	fluid: 'water',
	system: { kind: 'closed', mass: 2 },
	start: { T: 300, P: 1e6 },
	legs: [
		{ process: 'isobaric', target: { T: 500 } },
		{ process: 'isentropic', target: { P: 1e5 } },
		{ process: 'isobaric', target: { x: 0 } },
		{ process: 'isochoric', target: { T: 420 } }
	]
};
const p95 = time(() => computePath(path));
const p97 = time(() => computePath({ ...path, formulation: 'if97' }));
console.log(
	`4-leg water path: IAPWS-95 ${(p95 / 1000).toFixed(2)} ms, IF97 ${(p97 / 1000).toFixed(2)} ms (+${(((p97 - p95) / p95) * 100).toFixed(0)} %)`
);
const base = computePath(path);
const refix = time(() => if97Path(path, base));
console.log(
	`of which the IF97 re-fix of its 5 states and 4 legs (if97Path alone): ${refix.toFixed(0)} µs`
);

// one 200-point leg per process: the IAPWS-95 leg (computePath, one leg), its IF97 points and
// crossings alone (if97LegPoints), and the whole IF97 leg (computePath with formulation 'if97': the
// IAPWS-95 leg, then its ends, energies, points and crossings by IF97), against the 3 ms budget of a
// 200-point leg with its crossings (docs/performance.md)
const legs: [string, PathSpec][] = [
	[
		'isobaric 1 MPa, 300→600 K',
		{ start: { P: 1e6, T: 300 }, leg: { process: 'isobaric', target: { T: 600 } } }
	],
	[
		'isentropic 10 MPa 800 K→10 kPa',
		{ start: { P: 1e7, T: 800 }, leg: { process: 'isentropic', target: { P: 1e4 } } }
	],
	[
		'isochoric 0.1 m³/kg, 373→700 K',
		{ start: { T: 373.15, v: 0.1 }, leg: { process: 'isochoric', target: { T: 700 } } }
	],
	[
		'isothermal 450 K, liquid→vapor',
		{ start: { T: 450, v: 0.00111 }, leg: { process: 'isothermal', target: { v: 0.5 } } }
	],
	[
		'isenthalpic 10 MPa→0.1 MPa',
		{ start: { P: 1e7, T: 560 }, leg: { process: 'isenthalpic', target: { P: 1e5 } } }
	],
	[
		'polytropic n 1.2, 2 MPa→20 kPa',
		{ start: { P: 2e6, T: 600 }, leg: { process: 'polytropic', n: 1.2, target: { P: 2e4 } } }
	],
	[
		'isochoric near Tc, 600→660 K',
		{ start: { T: 600, v: 1 / 322 }, leg: { process: 'isochoric', target: { T: 660 } } }
	]
].map(([name, c]) => [
	name as string,
	{
		fluid: 'water',
		system: { kind: 'flow', massFlow: 1 },
		start: (c as { start: Inputs }).start,
		legs: [(c as { leg: PathSpec['legs'][number] }).leg],
		samples: 200
	}
]);
console.log(
	`\n200-point leg, median CPU ms: the IAPWS-95 leg, the IF97 re-fix of its points and crossings, the whole IF97 leg (budget 3 ms); load average ${loadavg()
		.map((x) => x.toFixed(1))
		.join(' ')}`
);
console.log('leg                              IAPWS-95 leg   IF97 points   IF97 leg (all)');
for (const [name, spec] of legs) {
	const r = computePath(spec);
	const r97 = computePath({ ...spec, formulation: 'if97' });
	const l = r.legs[0].leg;
	const s = r97.legs[0].leg.start;
	const e = r97.legs[0].leg.end;
	const tLeg = time(() => computePath(spec));
	const tPts = time(() => if97LegPoints(l.process, s, e, l.points, l.crossings, l.n));
	const tAll = time(() => computePath({ ...spec, formulation: 'if97' }));
	console.log(
		`${name.padEnd(32)} ${(tLeg / 1000).toFixed(2).padStart(12)}   ${(tPts / 1000).toFixed(2).padStart(11)}   ${(tAll / 1000).toFixed(2).padStart(14)}`
	);
}
