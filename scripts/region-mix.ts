/**
 * The larger region-mix round trip: every input pair of every state (src/lib/thermo/region-mix.ts).
 *   npx tsx scripts/region-mix.ts [states per fluid = 2000] [seed = 7] [fluid, or fluids joined by commas]
 * Prints per fluid its re-fixes, failures and time, then the failures by fluid and pair and the
 * first few in full. Each fluid draws from its own seeded generator, so a fluid run alone (or in a
 * batch) gives the same states as in the full run.
 */
import { loadavg } from 'node:os';
import { listFluids } from '../src/lib/thermo/index.ts';
import { fluidData } from '../src/lib/thermo/fluids/index.ts';
import { PAIR_LIST, runMix, type Failure } from '../src/lib/thermo/region-mix.ts';

const n = Number(process.argv[2] ?? 2000);
const seed = Number(process.argv[3] ?? 7);
const only = process.argv[4]?.split(',');
// a mixture's band has no two-phase states to draw from: runMix skips it (air-served.test.ts holds it)
const ids = listFluids()
	.map((f) => f.id)
	.filter((id) => (only ? only.includes(id) : !fluidData.find((d) => d.id === id)?.band));
const t0 = performance.now();
let tried = 0;
const failures: Failure[] = [];
console.log(
	`load average at start: ${loadavg()
		.map((x) => x.toFixed(2))
		.join(' ')}`
);
for (const id of ids) {
	const t1 = performance.now();
	const r = runMix(seed, n, true, id);
	tried += r.tried;
	failures.push(...r.failures);
	const s1 = ((performance.now() - t1) / 1000).toFixed(1);
	console.log(`  ${id}: ${n} states, ${r.tried} re-fixes, ${r.failures.length} failures (${s1} s)`);
}
const s = ((performance.now() - t0) / 1000).toFixed(1);
console.log(
	`region mix: ${ids.length} fluids × ${n} states, ${PAIR_LIST.length} pairs, seed ${seed}: ${tried} re-fixes, ${failures.length} failures (${s} s; load average at end ${loadavg()
		.map((x) => x.toFixed(2))
		.join(' ')})`
);
const by = new Map<string, number>();
for (const f of failures)
	by.set(`${f.fluid} (${f.pair})`, (by.get(`${f.fluid} (${f.pair})`) ?? 0) + 1);
for (const [k, v] of by) console.log(`  ${k}: ${v}`);
for (const f of failures.slice(0, 20)) console.log(JSON.stringify(f));
process.exitCode = failures.length ? 1 : 0;
