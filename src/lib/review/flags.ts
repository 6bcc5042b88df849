import type { NoteFlag } from '$lib/charts/types';
import type { NoteView } from './types';

/**
 * The open review notes as flags on the diagrams: one flag a leg or state with open threads, with
 * their count. Resolved and outdated notes and notes on the sheet as a whole have no flag. The
 * chart draws these in its drawing (so exports, the memo figure and the print view carry them);
 * the sheet page puts a button over each to open its threads (NoteMarkers).
 */
export function noteFlags(notes: readonly NoteView[]): NoteFlag[] {
	const byKey = new Map<string, NoteFlag & { ids: string[] }>();
	for (const n of notes) {
		if (n.resolved || n.outdated || n.anchor.kind === 'sheet') continue;
		const target =
			n.anchor.kind === 'leg'
				? { kind: 'leg' as const, id: n.anchor.legId }
				: { kind: 'state' as const, id: n.anchor.at };
		const key = `${target.kind}:${target.id}`;
		const f = byKey.get(key) ?? { key, target, count: 0, label: n.label ?? n.writtenAt, ids: [] };
		f.count++;
		f.ids.push(n.id);
		byKey.set(key, f);
	}
	return [...byKey.values()];
}

/** "2 open review notes on L2" */
export function flagText(f: Pick<NoteFlag, 'count' | 'label'>): string {
	return `${f.count} open review note${f.count > 1 ? 's' : ''} on ${f.label}`;
}
