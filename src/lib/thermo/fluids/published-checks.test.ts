/**
 * One generic test for every fluid that keeps its published check values as data beside it
 * (`<id>.checks.ts`, shape in checks.ts): each printed value must be reproduced to its printed
 * digits, and each fluid's declared reference state, critical point, normal boiling point and
 * saturation close to the critical point are checked the same way for all. The sources are named
 * in the data files, beside the values.
 */
// Sources of the check values: each table in <id>.checks.ts names its paper, table and the public copy it
// was read in (e.g. Lemmon, McLinden & Wagner (2009), Table 5, for propane); the normal boiling point at
// 101.325 kPa and the IIR/NBP reference states are the conventions of docs/compute-api.md; P′ = P″ and
// g′ = g″ at saturation are the phase-equilibrium conditions (identities, to 1e-9: common practice).
import { describe, expect, it } from 'vitest';
import { fixState, saturationCurve } from '../index.ts';
import type { State } from '../types.ts';
import { CHECK_UNITS, type CheckTable, type CheckUnit, type FluidChecks } from './checks.ts';
import { fluidData } from './index.ts';
import { checkedFluids } from './checked-fluids.ts';

/** Half a unit in the last printed digit of `text` (mantissa digits, times 10^exponent), times `unit`. */
function halfUnit(text: string, unit: number): number {
	const [mantissa, exponent] = text.replace(/^-/, '').toLowerCase().split('e');
	const decimals = mantissa.includes('.') ? mantissa.split('.')[1].length : 0;
	return 0.5 * 10 ** (Number(exponent ?? 0) - decimals) * Math.abs(unit);
}

/** SI factor of a unit (°C is handled apart: an offset). */
function factor(unit: CheckUnit, M: number): number {
	const f = CHECK_UNITS[unit];
	if (f === 'molar-density') return 1e3 * M;
	if (f === 'molar') return 1 / M;
	if (f === 'molar-k') return 1e3 / M;
	return f;
}

interface Column {
	name: string;
	unit: CheckUnit;
}

function parseColumn(text: string): Column {
	const m = /^(\w+) \[(.+)\]$/.exec(text);
	if (!m || !(m[2] in CHECK_UNITS))
		throw new Error(`column "${text}" is not "<property> [<known unit>]"`);
	return { name: m[1], unit: m[2] as CheckUnit };
}

const toSI = (text: string, c: Column, M: number) =>
	Number(text) * factor(c.unit, M) + (c.unit === 'degC' ? 273.15 : 0);
const ENERGY = new Set(['u', 'h', 's', 'uL', 'uV', 'hL', 'hV', 'sL', 'sV']);

interface Fixed {
	one: State | null;
	liq: State | null;
	vap: State | null;
}

/** The computed value a column names, from a single-phase state or a saturated pair. */
function computed(name: string, st: Fixed): number {
	const pick = (s: State | null, k: string): number => {
		const v = s?.[k as keyof State];
		if (typeof v !== 'number') throw new Error(`no ${k} in the computed state for column ${name}`);
		return v;
	};
	if (st.one) return pick(st.one, name);
	if (name === 'T' || name === 'P') return pick(st.liq, name);
	if (name.endsWith('L')) return pick(st.liq, name.slice(0, -1));
	if (name.endsWith('V')) return pick(st.vap, name.slice(0, -1));
	throw new Error(`column ${name} needs L or V on a saturation table`);
}

function runTable(id: string, M: number, table: CheckTable): string[] {
	const failures: string[] = [];
	const cols = table.columns.map(parseColumn);
	const inputs = { 'T-rho': ['T', 'rho'], 'T-P': ['T', 'P'], 'T-sat': ['T'], 'P-sat': ['P'] }[
		table.input
	];
	const rel = table.rel?.value ?? 0;
	const cell = (row: string[], name: string) => {
		const k = cols.findIndex((c) => c.name === name);
		if (k < 0) throw new Error(`table without a ${name} column`);
		return toSI(row[k], cols[k], M);
	};
	const fix = (row: string[]): Fixed => {
		if (table.input === 'T-sat' || table.input === 'P-sat') {
			const key = table.input === 'T-sat' ? 'T' : 'P';
			const v = cell(row, key);
			return {
				one: null,
				liq: fixState(id, { [key]: v, x: 0 }),
				vap: fixState(id, { [key]: v, x: 1 })
			};
		}
		const other = inputs[1];
		return {
			one: fixState(id, { T: cell(row, 'T'), [other]: cell(row, other) }),
			liq: null,
			vap: null
		};
	};
	const first = fix(table.rows[0]);
	for (const row of table.rows) {
		if (row.length !== cols.length)
			failures.push(`row ${row.join(' ')} has ${row.length} cells for ${cols.length} columns`);
		const st = fix(row);
		cols.forEach((c, k) => {
			const text = row[k];
			if (inputs.includes(c.name) || text === '') return;
			const f = factor(c.unit, M);
			let actual = computed(c.name, st);
			let expected = toSI(text, c, M);
			let tol = halfUnit(text, f) + rel * Math.abs(expected);
			if (table.energies === 'differences' && ENERGY.has(c.name)) {
				// from the first row's first column of the same energy (h′ of the first row for h′ and h″)
				const b = cols.findIndex((o) => o.name[0] === c.name[0] && ENERGY.has(o.name));
				const base = table.rows[0][b];
				actual -= computed(cols[b].name, first);
				expected -= toSI(base, cols[b], M);
				tol += halfUnit(base, factor(cols[b].unit, M));
			}
			tol *= 1 + 1e-9;
			if (!(Math.abs(actual - expected) <= tol))
				failures.push(
					`${table.input} ${row.join(' ')}: ${c.name} = ${(actual / f).toPrecision(9)} vs printed ${text} [${c.unit}] (tolerance ${(tol / f).toPrecision(3)})`
				);
		});
	}
	return failures;
}

describe.each(checkedFluids.map((c): [string, FluidChecks] => [c.fluid, c]))(
	'%s: published check values',
	(id, checks) => {
		const data = fluidData.find((f) => f.id === id)!;

		it('is registered', () => {
			expect(data).toBeDefined();
		});

		it.each(checks.tables.map((t, k): [number, CheckTable] => [k, t]))(
			'reproduces table %i to its printed digits',
			(_, table) => {
				expect(runTable(id, data.molarMass, table)).toEqual([]);
			}
		);

		it('passes through its published critical point', () => {
			const c = checks.critical;
			if (!c) return;
			const [uT, uP, uRho] = c.units.map((u, k) => ({ name: ['T', 'P', 'rho'][k], unit: u }));
			const P = fixState(id, {
				T: toSI(c.T, uT, data.molarMass),
				rho: toSI(c.rho, uRho, data.molarMass)
			}).P;
			const expected = toSI(c.P, uP, data.molarMass);
			const tol =
				Math.max(halfUnit(c.P, factor(uP.unit, data.molarMass)), (c.rel ?? 0) * expected) *
				(1 + 1e-9);
			expect(Math.abs(P - expected), `P(Tc, ρc) = ${P} (${c.source})`).toBeLessThanOrEqual(tol);
		});

		it('boils at its published normal boiling point', () => {
			const nbp = checks.normalBoilingPoint;
			if (!nbp) return;
			const T = fixState(id, { P: 101325, x: 0 }).T;
			expect(Math.abs(T - Number(nbp.T)), `T_b = ${T} (${nbp.source})`).toBeLessThanOrEqual(
				halfUnit(nbp.T, 1) * (1 + 1e-9)
			);
		});

		it('lists the triple-point pressure its equation gives (to its rounding, 5e-4)', () => {
			const P = fixState(id, { T: data.triple.T, x: 0 }).P;
			expect(Math.abs(P / data.triple.P - 1), `p_t = ${P} Pa`).toBeLessThan(5e-4);
		});

		it('has its declared reference state', () => {
			const rs = data.referenceState;
			if (rs.kind === 'as-published') return;
			const liq =
				rs.kind === 'saturated-liquid-at-T'
					? fixState(id, { T: rs.T, x: 0 })
					: fixState(id, { P: rs.P, x: 0 });
			expect(Math.abs(liq.h - rs.h)).toBeLessThan(1e-6);
			expect(Math.abs(liq.s - rs.s)).toBeLessThan(1e-9);
		});

		it('has two phases in equilibrium from the triple point to 1 mK below its critical point', () => {
			const crit = saturationCurve(id, 10).critical;
			const Tt = data.triple.T;
			for (const T of [
				Tt + 0.1 * (crit.T - Tt),
				Tt + 0.5 * (crit.T - Tt),
				0.99 * crit.T,
				crit.T - 0.1,
				crit.T - 0.01,
				crit.T - 1e-3
			]) {
				const liq = fixState(id, { T, x: 0 });
				const vap = fixState(id, { T, x: 1 });
				expect(liq.rho, `ρ′ > ρ″ at ${T}`).toBeGreaterThan(vap.rho);
				expect(Math.abs(liq.P / vap.P - 1), `P′ = P″ at ${T}`).toBeLessThan(1e-9);
				const g = (st: State) => st.h - T * st.s;
				expect(Math.abs(g(liq) - g(vap)) / (data.R * T), `g′ = g″ at ${T}`).toBeLessThan(1e-9);
			}
		});
	}
);
