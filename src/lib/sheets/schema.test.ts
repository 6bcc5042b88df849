import { describe, expect, it } from 'vitest';
import { parseSheetDoc } from './schema';
import { makeDoc } from './doc';
import { SHEET_DOC_VERSION, type SheetDoc } from './types';

function doc(): SheetDoc {
	return makeDoc({
		spec: {
			fluid: 'water',
			system: { kind: 'closed', mass: 12 },
			start: { T: 373.15, x: 0.1 },
			legs: [
				{ id: 'Laaaaaa', process: 'isochoric', target: { T: 450 } },
				{ id: 'Lbbbbbb', process: 'polytropic', target: { v: 0.2 }, n: 1.3 }
			],
			limits: { designPressure: 1.1e6 }
		},
		units: { pressureReference: 'gauge', atmosphere: 95_000 }
	});
}

function expectRefused(raw: unknown, pattern: RegExp) {
	const r = parseSheetDoc(raw);
	expect(r.ok).toBe(false);
	if (!r.ok) expect(r.message).toMatch(pattern);
}

describe('sheet document validation', () => {
	it('accepts a current document and keeps the spec’s atmosphere equal to the units’', () => {
		const d = doc();
		d.spec.atmosphericPressure = 101_325;
		const r = parseSheetDoc(d);
		expect(r.ok).toBe(true);
		if (r.ok) {
			expect(r.migratedFrom).toBeNull();
			expect(r.doc.spec.atmosphericPressure).toBe(95_000);
			expect(r.doc.spec.legs.map((l) => l.id)).toEqual(['Laaaaaa', 'Lbbbbbb']);
		}
	});

	it('refuses what the engine could never compute, naming what to give instead', () => {
		const mutate = (f: (d: SheetDoc & Record<string, unknown>) => void) => {
			const d = doc() as SheetDoc & Record<string, unknown>;
			f(d);
			return d;
		};
		expectRefused(
			mutate((d) => (d.spec.start = { T: 300 })),
			/exactly two properties/
		);
		expectRefused(
			mutate((d) => (d.spec.start = { v: 1, rho: 1 })),
			/same property/
		);
		expectRefused(
			mutate((d) => (d.spec.start = { T: -3, x: 0.5 })),
			/T must be above zero/
		);
		expectRefused(
			mutate((d) => (d.spec.start = { T: 300, x: 1.5 })),
			/quality\) must be from 0 to 1/
		);
		expectRefused(
			mutate((d) => (d.spec.fluid = 'unobtainium')),
			/must be one of water/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[0].target = { v: 0.1 })),
			/isochoric leg keeps v constant/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[0].target = { T: 400, P: 1e5 })),
			/exactly one target/
		);
		expectRefused(
			mutate((d) => delete d.spec.legs[1].n),
			/needs n/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[0].n = 1.2)),
			/polytropic legs only/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[1].id = 'Laaaaaa')),
			/Two legs have the id/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[1].id = 'start')),
			/names the first state/
		);
		expectRefused(
			mutate((d) => (d.spec.legs[1].id = 'bad id!')),
			/leg id is 1 to 40/
		);
		expectRefused(
			mutate((d) => (d.spec.system = { kind: 'closed', mass: 1, volume: 1 })),
			/mass or its volume, not both/
		);
		expectRefused(
			mutate((d) => (d.units.atmosphere = 5_000)),
			/20 to 120 kPa/
		);
		expectRefused(
			mutate((d) => (d.titleBlock.tag = 'x'.repeat(61))),
			/Tag must be at most 60/
		);
		expectRefused(
			mutate((d) => (d.extra = 1)),
			/Unrecognized key|unrecognized|sheet document/i
		);
		expectRefused(
			mutate(
				(d) =>
					(d.spec.legs = Array.from({ length: 51 }, (_, i) => ({
						id: `L${i}x`,
						process: 'isobaric' as const,
						target: { T: 400 }
					})))
			),
			/at most 50 legs/
		);
		expectRefused('a string', /JSON object/);
	});

	it('refuses a version newer than it reads, and a nonsense version', () => {
		expectRefused({ ...doc(), version: SHEET_DOC_VERSION + 1 }, /newer than this server reads/);
		expectRefused({ ...doc(), version: 'one' }, /whole number/);
	});
});

describe('migrating older documents', () => {
	it('wraps a bare PathSpec (as scripts send it), giving legs ids and the units its atmosphere', () => {
		const r = parseSheetDoc({
			fluid: 'water',
			system: { kind: 'closed', volume: 0.5 },
			start: { T: 393.15, x: 0.0001 },
			legs: [
				{ id: 'fire-heating', process: 'isochoric', target: { T: 493.15 } },
				{ process: 'isochoric', target: { T: 500 } }
			],
			limits: { designPressure: 1.6e6 },
			atmosphericPressure: 90_000
		});
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.migratedFrom).toBe(0);
		expect(r.doc.version).toBe(SHEET_DOC_VERSION);
		expect(r.doc.spec.legs[0].id).toBe('fire-heating');
		expect(r.doc.spec.legs[1].id).toMatch(/^L[a-z2-9]{6}$/);
		expect(r.doc.units.atmosphere).toBe(90_000);
		expect(r.doc.units.system).toBe('si');
		expect(r.doc.chart).toEqual({ view: 'both', pressureScale: 'log', isolines: true });
		expect(r.doc.titleBlock.project).toBe('');
	});

	it('fills what an unversioned draft lacks and renames duplicate leg ids', () => {
		const old = doc() as unknown as Record<string, unknown>;
		delete old.version;
		delete old.chart;
		(old.titleBlock as Record<string, string>) = { tag: 'V-1' } as never;
		(old.spec as { legs: { id: string }[] }).legs[1].id = 'Laaaaaa';
		const r = parseSheetDoc(old);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.doc.titleBlock).toEqual({
			project: '',
			equipment: '',
			tag: 'V-1',
			documentNumber: '',
			site: ''
		});
		expect(r.doc.units.atmosphere).toBe(95_000);
		const ids = r.doc.spec.legs.map((l) => l.id);
		expect(ids[0]).toBe('Laaaaaa');
		expect(ids[1]).not.toBe('Laaaaaa');
	});

	it('an unversioned document that is still wrong is refused, not guessed', () => {
		expectRefused(
			{ fluid: 'water', system: { kind: 'closed' }, start: { T: 300 }, legs: [] },
			/exactly two properties/
		);
	});
});

describe('start by fill level in the document', () => {
	it('keeps the fill spec and writes the T and v it gives into spec.start', () => {
		const d = { ...doc(), startSpec: { kind: 'fill', fraction: 0.8, T: 450 } };
		d.spec.start = { T: 300, x: 0.5 }; // stale: the fill wins
		const r = parseSheetDoc(JSON.parse(JSON.stringify(d)));
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.doc.startSpec).toEqual({ kind: 'fill', fraction: 0.8, T: 450 });
		// IAPWS R6-95(2018), Table 8, T = 450 K: ρ′ = 890.341250, ρ″ = 4.81200360 kg/m³
		expect(r.doc.spec.start.T).toBe(450);
		expect(Math.abs(r.doc.spec.start.v! * (0.8 * 890.34125 + 0.2 * 4.8120036) - 1)).toBeLessThan(
			1e-8
		);
		expect(Object.keys(r.doc.spec.start).sort()).toEqual(['T', 'v']);
		// and it round-trips unchanged
		const again = parseSheetDoc(JSON.parse(JSON.stringify(r.doc)));
		expect(again.ok && again.doc).toEqual(r.doc);
	});

	it('refuses a fill that cannot be: out of 0…1, both T and P, above the critical point, a flow device', () => {
		const base = doc();
		expectRefused(
			{ ...base, startSpec: { kind: 'fill', fraction: 80, T: 300 } },
			/from 0 \(all vapor\) to 1/
		);
		expectRefused(
			{ ...base, startSpec: { kind: 'fill', fraction: 0.8, T: 300, P: 1e5 } },
			/one of them, not both/
		);
		expectRefused(
			{ ...base, startSpec: { kind: 'fill', fraction: 0.8, T: 700 } },
			/No fill level there: .*critical/
		);
		expectRefused(
			{ ...base, startSpec: { kind: 'level', fraction: 0.8, T: 300 } },
			/kind must be "fill"/
		);
		expectRefused(
			{
				...base,
				spec: { ...base.spec, system: { kind: 'flow', massFlow: 1 } },
				startSpec: { kind: 'fill', fraction: 0.8, T: 300 }
			},
			/closed system/
		);
	});
});
