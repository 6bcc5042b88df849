/**
 * Cost of the background lines by kind (what the charts ask for: 9 lines × 100 points). Prints
 * figures; never fails. Run: npm run bench:isolines
 */
import { getFluid, isolines, saturationAtT } from '../src/lib/thermo/index.ts';

function cpuMs(f: () => unknown): number {
	f(); // warm
	const a = process.cpuUsage();
	f();
	const d = process.cpuUsage(a);
	return (d.user + d.system) / 1000;
}

console.log('Statewright isolines — CPU ms for 9 lines × 100 points, and µs per point\n');
for (const id of ['water', 'ammonia', 'r134a']) {
	const f = getFluid(id);
	const Ts = Array.from(
		{ length: 9 },
		(_, i) => f.triple.T + ((i + 1) / 10) * (f.critical.T - f.triple.T)
	);
	const sats = Ts.map((T) => saturationAtT(id, T));
	const kinds = {
		isobar: sats.map((s) => s.P),
		isotherm: Ts,
		isochore: sats.map((s) => s.vapor.v),
		isentrope: sats.map((s) => s.vapor.s),
		isenthalp: sats.map((s) => 0.5 * (s.liquid.h + s.vapor.h)),
		quality: [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9]
	} as const;
	for (const [kind, values] of Object.entries(kinds)) {
		const ms = cpuMs(() => isolines(id, kind as keyof typeof kinds, [...values], 100));
		console.log(
			`${id.padEnd(8)} ${kind.padEnd(10)} ${ms.toFixed(0).padStart(5)} ms  ${((ms * 1000) / 900).toFixed(1).padStart(7)} µs/point`
		);
	}
}
