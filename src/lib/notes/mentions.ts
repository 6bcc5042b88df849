/**
 * @mentions in review notes. A mention is "@" followed by a team member's full name
 * ("@Priya Ramanathan") or, where no other member shares it, their first name ("@Priya"),
 * matched without regard to case and ending at a word boundary. The longest name wins, so
 * "@Priya Ramanathan" is never read as "@Priya" plus text. Pure and client-safe: the editor
 * highlights what the server will notify.
 */

export interface Mentionable {
	id: string;
	name: string;
}

export interface Mention {
	id: string;
	/** index of the "@" in the text */
	start: number;
	/** index after the matched name */
	end: number;
}

function candidates(members: readonly Mentionable[]): Array<{ key: string; id: string }> {
	const out: Array<{ key: string; id: string }> = [];
	const firstCount = new Map<string, number>();
	for (const m of members) {
		const first = m.name.trim().split(/\s+/)[0]?.toLowerCase();
		if (first) firstCount.set(first, (firstCount.get(first) ?? 0) + 1);
	}
	for (const m of members) {
		const full = m.name.trim().replace(/\s+/g, ' ').toLowerCase();
		if (full) out.push({ key: full, id: m.id });
		const first = full.split(' ')[0];
		if (first && first !== full && firstCount.get(first) === 1) out.push({ key: first, id: m.id });
	}
	// longest first, so a full name beats a first name that starts it
	return out.sort((a, b) => b.key.length - a.key.length);
}

const WORD = /[\p{L}\p{N}_]/u;

/** Every mention in the text, in order. */
export function findMentions(text: string, members: readonly Mentionable[]): Mention[] {
	const list = candidates(members);
	const lower = text.toLowerCase();
	const found: Mention[] = [];
	for (let i = lower.indexOf('@'); i >= 0; i = lower.indexOf('@', i + 1)) {
		if (i > 0 && WORD.test(text[i - 1])) continue; // an e-mail address, not a mention
		const rest = lower.slice(i + 1).replace(/\s+/g, ' ');
		const hit = list.find((c) => rest.startsWith(c.key) && !WORD.test(rest.charAt(c.key.length)));
		if (!hit) continue;
		// map the matched length back onto the original text (runs of spaces were collapsed)
		let end = i + 1;
		let matched = 0;
		while (matched < hit.key.length && end < text.length) {
			if (/\s/.test(text[end])) {
				while (end + 1 < text.length && /\s/.test(text[end + 1])) end++;
			}
			end++;
			matched++;
		}
		found.push({ id: hit.id, start: i, end });
	}
	return found;
}

/** The distinct people mentioned, in order of first mention. */
export function mentionedIds(text: string, members: readonly Mentionable[]): string[] {
	return [...new Set(findMentions(text, members).map((m) => m.id))];
}
