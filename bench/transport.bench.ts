/**
 * Transport-property benchmark: median CPU µs per transport(state) call, per fluid with correlations,
 * over single-phase states and saturated liquid/vapor (states precomputed), beside the cost of the
 * (P, T) state itself; and the cost of adding transport to every state of a path and to every point of
 * a leg. Prints figures; never fails on time. `npm run bench:transport`.
 */
import { loadavg } from 'node:os';
import { computeLeg, fixState, transport } from '../src/lib/thermo/index.ts';
import type { State } from '../src/lib/thermo/types.ts';

function median(xs: number[]): number {
	const s = [...xs].sort((a, b) => a - b);
	return s[s.length >> 1];
}

/** Median CPU µs per call over batches of ~0.5 ms, after a warm-up of at least 0.2 s. */
function time(calls: (() => unknown)[]): number {
	const n = calls.length;
	const w0 = performance.now();
	let warm = 0;
	while (warm < 1000 || performance.now() - w0 < 200) calls[warm++ % n]();
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

const cases: [string, [number, number][], number[]][] = [
	// fluid, single-phase (T K, P Pa), saturation temperatures K
	[
		'water',
		[
			[300, 1e5],
			[500, 1e6],
			[700, 30e6],
			[900, 10e6]
		],
		[300, 450, 600]
	],
	[
		'nitrogen',
		[
			[80, 1e6],
			[130, 3.5e6],
			[300, 1e5],
			[500, 50e6]
		],
		[70, 100, 120]
	],
	[
		'argon',
		[
			[100, 2e6],
			[160, 5e6],
			[300, 1e5]
		],
		[90, 120, 145]
	],
	[
		'oxygen',
		[
			[100, 2e6],
			[160, 5.1e6],
			[300, 1e5]
		],
		[90, 120, 150]
	],
	[
		'carbon-dioxide',
		[
			[250, 5e6],
			[310, 8e6],
			[400, 1e5],
			[800, 50e6]
		],
		[220, 260, 300]
	],
	[
		'hydrogen',
		[
			[20, 1e6],
			[35, 1.5e6],
			[300, 1e5],
			[600, 50e6]
		],
		[16, 24, 31]
	],
	[
		'methane',
		[
			[120, 1e6],
			[195, 5e6],
			[300, 1e5],
			[500, 50e6]
		],
		[100, 150, 185]
	],
	[
		'r134a',
		[
			[280, 2e6],
			[320, 2e5],
			[380, 5e6]
		],
		[240, 300, 360]
	],
	[
		'r1234yf',
		[
			[280, 2e6],
			[320, 2e5],
			[380, 5e6]
		],
		[240, 300, 350]
	],
	[
		'r1234ze-e',
		[
			[280, 2e6],
			[320, 2e5],
			[390, 5e6]
		],
		[240, 300, 370]
	]
];

console.log(`transport(state), median CPU µs per call (load ${loadavg()[0].toFixed(2)})`);
console.log('fluid            transport   (P, T) state');
for (const [fluid, single, sats] of cases) {
	const states: State[] = [
		...single.map(([T, P]) => fixState(fluid, { T, P })),
		...sats.flatMap((T) => [fixState(fluid, { T, x: 0 }), fixState(fluid, { T, x: 1 })])
	];
	const tr = time(states.map((s) => () => transport(s)));
	const st = time(
		single.map(
			([T, P]) =>
				() =>
					fixState(fluid, { T, P })
		)
	);
	console.log(`${fluid.padEnd(16)} ${tr.toFixed(2).padStart(9)}   ${st.toFixed(2).padStart(12)}`);
}

// a leg's points: transport at each of its points against the leg itself
const leg = () =>
	computeLeg({
		fluid: 'nitrogen',
		start: { T: 300, P: 1e6 },
		process: 'isobaric',
		target: { T: 100 }
	});
const l = leg();
const points = l.points;
const legCost = time([leg]);
const pointsCost = time([() => points.forEach((p) => transport(p))]);
console.log(
	`nitrogen isobaric leg 300 K → 100 K at 1 MPa: leg ${legCost.toFixed(0)} µs; transport at its ${points.length} points ${pointsCost.toFixed(0)} µs`
);
