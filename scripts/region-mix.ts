/**
 * The larger region-mix round trip: every input pair of every state (src/lib/thermo/region-mix.ts).
 *   npx tsx scripts/region-mix.ts [states per fluid = 2000] [seed = 7] [fluid]
 * Prints the number of re-fixes, the failures by fluid and pair, and the first few in full.
 */
import { PAIR_LIST, runMix } from '../src/lib/thermo/region-mix.ts';

const n = Number(process.argv[2] ?? 2000);
const seed = Number(process.argv[3] ?? 7);
const only = process.argv[4];
const t0 = performance.now();
const { tried, failures } = runMix(seed, n, true, only);
const s = ((performance.now() - t0) / 1000).toFixed(1);
console.log(
	`region mix: ${n} states per fluid, ${PAIR_LIST.length} pairs, seed ${seed}: ${tried} re-fixes, ${failures.length} failures (${s} s)`
);
const by = new Map<string, number>();
for (const f of failures)
	by.set(`${f.fluid} (${f.pair})`, (by.get(`${f.fluid} (${f.pair})`) ?? 0) + 1);
for (const [k, v] of by) console.log(`  ${k}: ${v}`);
for (const f of failures.slice(0, 20)) console.log(JSON.stringify(f));
process.exitCode = failures.length ? 1 : 0;
