import { CAUTION_TITLE, PRESSURE_EQUIPMENT_CAUTION } from '$lib/cautions';
import { sheetWarnings } from '$lib/sheets/warnings';
import type { SheetLegSpec } from '$lib/sheets/types';
import type { FluidInfo, PathResult } from '$lib/thermo/types';
import { formatQuantity, type UnitPrefs } from '$lib/units';
import { tidy } from '$lib/sheets/format';

/**
 * What a memo says besides the numbers: the warnings under the state table (the same words as the
 * screen, from sheetWarnings), the cycle's results when the path closes, and the brief's caution.
 * Every export (print view, CSV, Markdown, memo figure) writes these from here.
 */
export interface MemoFinding {
	severity: 'caution' | 'warning' | 'info';
	title: string;
	text: string;
}

export interface MemoFindings {
	warnings: MemoFinding[];
	/** "Reverse cycle: COP heating 4.12, COP cooling 3.12 …", or null when the path is not a cycle */
	cycle: string | null;
	/** the code-deferral caution, always, under this heading (the screen's) */
	caution: string;
	cautionTitle: string;
}

export interface FindingsInput {
	result: PathResult;
	legs: readonly SheetLegSpec[];
	prefs: UnitPrefs;
	fluid: FluidInfo | null;
}

const SEVERITY_WORD = { caution: 'Caution', warning: 'Warning', info: 'Note' } as const;

/** "Caution", "Warning" or "Note" for a finding's severity. */
export function severityWord(s: MemoFinding['severity']): string {
	return SEVERITY_WORD[s];
}

/** The cycle's results in words, with per-kg energies in the sheet's units; null when not a cycle. */
export function cycleText(
	result: PathResult,
	prefs: UnitPrefs,
	style: 'unicode' | 'ascii' = 'unicode'
): string | null {
	const c = result.cycle;
	if (!c) return null;
	const e = (si: number) =>
		formatQuantity(tidy(si, 'specificEnergy'), 'specificEnergy', prefs, { style }).full.replace(
			/\u00a0/g,
			' '
		);
	const flows = `heat added ${e(c.heatAdded)}, heat rejected ${e(c.heatRejected)}, net work by the fluid ${e(c.netWork)}`;
	if (c.kind === 'power') {
		const eta = formatQuantity(c.thermalEfficiency ?? 0, 'fraction', prefs, { style }).full.replace(
			/\u00a0/g,
			' '
		);
		return `Power cycle: thermal efficiency ${eta}; ${flows}.`;
	}
	if (c.kind === 'reverse')
		return `Reverse cycle: COP heating ${(c.copHeating ?? 0).toFixed(2)}, COP cooling ${(c.copCooling ?? 0).toFixed(2)}; ${flows}.`;
	return `Closed cycle with no net work; ${flows}.`;
}

/**
 * The findings of a computed path. The pressure-equipment caution is carried once, as `caution`
 * (the warning list on the screen shows it first when limits are set; here it is not repeated).
 */
export function memoFindings(
	input: FindingsInput,
	style: 'unicode' | 'ascii' = 'unicode'
): MemoFindings {
	const warnings = sheetWarnings(input.result, input.legs, input.prefs, input.fluid)
		.filter((w) => w.code !== 'pressure-equipment-caution')
		.map((w) => ({ severity: w.severity, title: w.title, text: w.text.replace(/\u00a0/g, ' ') }));
	return {
		warnings,
		cycle: cycleText(input.result, input.prefs, style),
		caution: PRESSURE_EQUIPMENT_CAUTION,
		cautionTitle: CAUTION_TITLE
	};
}

/** The findings as plain lines: "Caution — Liquid-full: …", the cycle, then the caution. */
export function findingLines(f: MemoFindings): string[] {
	return [
		...f.warnings.map((w) => `${severityWord(w.severity)} — ${w.title}: ${w.text}`),
		...(f.cycle ? [f.cycle] : []),
		f.caution
	];
}
