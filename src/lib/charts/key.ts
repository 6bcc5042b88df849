import type { Process } from '$lib/thermo/types';
import { PROCESS_ORDER, processStyle } from './encoding';
import { textWidth } from './labels';
import type { ChartLeg } from './types';

export type KeyEntry =
	| { kind: 'process'; process: Process; text: string }
	| { kind: 'crossing'; text: string }
	| { kind: 'limit'; text: string }
	| { kind: 'trace'; text: string }
	| { kind: 'trace-band'; text: string }
	| { kind: 'note-flag'; text: string }
	| { kind: 'revision'; text: string };

/**
 * What the key lists: the processes the path uses (in a fixed order), then the marks present; an
 * overlaid revision (Compare) by its own label, never as "measured".
 */
export function keyEntries(
	legs: readonly ChartLeg[],
	extras: {
		limits: boolean;
		traces: boolean;
		bands?: boolean;
		/** open review notes are flagged on the chart */
		flags?: boolean;
		revisions?: readonly string[];
	}
): KeyEntry[] {
	const used = new Set(legs.map((l) => l.process));
	const out: KeyEntry[] = PROCESS_ORDER.filter((p) => used.has(p)).map((p) => ({
		kind: 'process',
		process: p,
		text: processStyle(p).name
	}));
	if (legs.some((l) => l.crossings.length > 0))
		out.push({ kind: 'crossing', text: 'saturation crossing' });
	if (extras.limits) out.push({ kind: 'limit', text: 'design limit' });
	if (extras.traces) out.push({ kind: 'trace', text: 'measured' });
	// readings on the saturation line: P and T put them on the isobar across the dome, v open
	if (extras.bands)
		out.push({ kind: 'trace-band', text: 'measured at saturation (v not fixed by P, T)' });
	if (extras.flags) out.push({ kind: 'note-flag', text: 'open review notes (count)' });
	for (const text of extras.revisions ?? []) out.push({ kind: 'revision', text });
	return out;
}

export const KEY = { sample: 26, gap: 6, spacing: 16, row: 16, font: 11 } as const;

export interface KeySlot {
	entry: KeyEntry;
	x: number;
	row: number;
}

/** Lay key entries out left to right, wrapping at `maxWidth`. */
export function layoutKey(
	entries: readonly KeyEntry[],
	maxWidth: number
): { slots: KeySlot[]; rows: number } {
	const slots: KeySlot[] = [];
	let x = 0;
	let row = 0;
	for (const entry of entries) {
		const w = KEY.sample + KEY.gap + textWidth(entry.text, KEY.font, false);
		if (x > 0 && x + w > maxWidth) {
			row += 1;
			x = 0;
		}
		slots.push({ entry, x, row });
		x += w + KEY.spacing;
	}
	return { slots, rows: entries.length ? row + 1 : 0 };
}
