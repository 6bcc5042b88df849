/**
 * A water sheet by IAPWS-IF97: the document field (schema, edits, engineSpec), the first state of a
 * sheet without legs, the table's formulation name and difference text, the title block's name.
 * Numbers: python3-iapws 1.5.2 (Debian) IAPWS97 and IAPWS95, named beside each check.
 */
import { describe, expect, it } from 'vitest';
import * as engine from '$lib/thermo';
import { computePath } from '$lib/thermo';
import { sheetFormulation } from '$lib/export/title';
import { sheetTable } from '$lib/export/table';
import { setFluid, setFormulation } from '$lib/editor/edits';
import { engineSpec, firstStateResult, makeDoc } from './doc';
import { diffDocs } from './diff';
import { differenceText, formulationText } from './format';
import { parseSheetDoc } from './schema';
import type { SheetDoc } from './types';
import { DEFAULT_UNIT_PREFS, type UnitPrefs } from '$lib/units/prefs';

function waterDoc(legs = true): SheetDoc {
	return makeDoc({
		spec: {
			fluid: 'water',
			system: { kind: 'flow', massFlow: 0.04 },
			start: { P: 601_325, x: 1 },
			legs: legs
				? [
						{ id: 'Laaaaaa', process: 'isobaric', target: { x: 0 } },
						{ id: 'Lbbbbbb', process: 'isenthalpic', target: { P: 151_325 } }
					]
				: []
		}
	});
}

const WATER = {
	name: 'Water',
	formula: 'H2O',
	formulation: { name: 'IAPWS-95', reference: 'IAPWS R6-95(2018)' }
};

describe('the formulation field of a sheet', () => {
	it('is accepted for water and refused with a 400-style message for another fluid', () => {
		const d = waterDoc();
		d.spec.formulation = 'if97';
		const ok = parseSheetDoc(d);
		expect(ok.ok).toBe(true);
		if (ok.ok) expect(ok.doc.spec.formulation).toBe('if97');
		const n = { ...d, spec: { ...d.spec, fluid: 'nitrogen', start: { T: 300, P: 1e6 } } };
		const bad = parseSheetDoc(n);
		expect(bad.ok).toBe(false);
		if (!bad.ok) expect(bad.message).toMatch(/water only/);
		const unknown = parseSheetDoc({ ...d, spec: { ...d.spec, formulation: 'if2000' } });
		expect(unknown.ok).toBe(false);
		if (!unknown.ok) expect(unknown.message).toMatch(/"iapws95".*"if97"/);
	});
	it('setFormulation sets and clears it; another fluid drops it; engineSpec carries it', () => {
		const d = waterDoc();
		const r = setFormulation(d, 'if97');
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.doc.spec.formulation).toBe('if97');
		expect(engineSpec(r.doc).formulation).toBe('if97');
		expect(engineSpec(d).formulation).toBeUndefined();
		const back = setFormulation(r.doc, 'iapws95');
		expect(back.ok && back.doc.spec.formulation).toBe(undefined);
		expect(setFluid(r.doc, 'nitrogen').spec.formulation).toBeUndefined();
		const n = setFluid(d, 'nitrogen');
		expect(setFormulation(n, 'if97').ok).toBe(false);
		// a revision compare or a save conflict names the change
		expect(diffDocs(d, r.doc)).toContainEqual({
			section: 'Sheet',
			field: 'formulation',
			a: 'IAPWS-95',
			b: 'IAPWS-IF97'
		});
	});
});

describe('numbers of an IF97 sheet', () => {
	it('its states are IF97’s and the difference row gives IF97 − IAPWS-95', () => {
		const d = waterDoc();
		d.spec.formulation = 'if97';
		const r = computePath(engineSpec(d));
		const prefs: UnitPrefs = { ...DEFAULT_UNIT_PREFS, pressureUnit: 'kPa' };
		// python3-iapws 1.5.2: IAPWS97(P=0.601325, x=0).h = 670.8758 kJ/kg, IAPWS95(…).h = 670.7515 kJ/kg
		expect(r.states[1].state.h / 1e3).toBeCloseTo(670.8758, 3);
		expect(r.states[1].iapws95!.h / 1e3).toBeCloseTo(670.7515, 3);
		expect(differenceText(r.states[1], 'h', prefs)).toMatch(/^\+0\.124\s?kJ\/kg$/);
		// T: IAPWS97(P=0.601325, x=1).T − IAPWS95(…).T = 432.06866 − 432.06270 = +0.00596 K
		expect(differenceText(r.states[0], 'T', prefs)).toMatch(/^\+0\.00596\s?K$/);
		// a pressure difference has no gauge zero: S1's P is the same pair's P, so 0
		expect(differenceText(r.states[0], 'P', { ...prefs, pressureReference: 'gauge' })).toMatch(
			/^0\s?kPa/
		);
		// the exports' table says so in its note
		expect(sheetTable(r, prefs).note).toMatch(/IAPWS-IF97/);
		// an IAPWS-95 sheet has no difference
		const r95 = computePath(engineSpec(waterDoc()));
		expect(differenceText(r95.states[1], 'h', prefs)).toBeNull();
		expect(sheetTable(r95, prefs).note).not.toMatch(/IF97/);
	});
	it('a sheet without legs: S1 by IF97 from the same pair', () => {
		const d = waterDoc(false);
		d.spec.formulation = 'if97';
		const r = firstStateResult(d, engine);
		expect(r.formulation).toBe('if97');
		// python3-iapws 1.5.2: IAPWS97(P=0.601325, x=1).h = 2756.2348 kJ/kg
		expect(r.states[0].state.h / 1e3).toBeCloseTo(2756.2348, 3);
		expect(r.states[0].iapws95!.h / 1e3).toBeCloseTo(2756.2388, 3);
		// IF97's own saturation line: T_sat(0.601325 MPa) = 432.0687 K
		expect(r.states[0].extras.Tsat).toBeCloseTo(432.06866, 4);
	});
	it('the table and the title block name the formulation', () => {
		expect(formulationText('water', undefined)).toBe('IAPWS-95');
		expect(formulationText('water', 'if97')).toBe('IAPWS-IF97');
		expect(formulationText('nitrogen', undefined, 'Span et al. (2000)')).toBe('Span et al. (2000)');
		const d = waterDoc();
		expect(sheetFormulation(d, WATER)).toBe('IAPWS-95 — IAPWS R6-95(2018)');
		d.spec.formulation = 'if97';
		expect(sheetFormulation(d, WATER)).toBe('IAPWS-IF97 — IAPWS R7-97(2012)');
	});
});
