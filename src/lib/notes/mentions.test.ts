import { describe, expect, it } from 'vitest';
import { findMentions, mentionedIds } from './mentions';

const team = [
	{ id: 'p', name: 'Priya Ramanathan' },
	{ id: 't', name: 'Tobias Lindqvist' },
	{ id: 'm', name: 'Maren Okafor' },
	{ id: 'm2', name: 'Maren  Holt' }
];

describe('mentions', () => {
	it('finds full names and unique first names, case-insensitive, longest first', () => {
		expect(mentionedIds('@Priya Ramanathan please look at L2', team)).toEqual(['p']);
		expect(mentionedIds('@priya and @TOBIAS: see S3', team)).toEqual(['p', 't']);
		const m = findMentions('Ask @Priya Ramanathan.', team)[0];
		expect('Ask @Priya Ramanathan.'.slice(m.start, m.end)).toBe('@Priya Ramanathan');
	});

	it('does not take a shared first name, an e-mail address or a longer word', () => {
		expect(mentionedIds('@Maren what do you think?', team)).toEqual([]);
		expect(mentionedIds('@Maren Okafor and @maren holt', team)).toEqual(['m', 'm2']);
		expect(mentionedIds('write to priya@brindlemoor.example', team)).toEqual([]);
		expect(mentionedIds('@Priyanka is new', team)).toEqual([]);
		expect(mentionedIds('@Priya @Priya twice', team)).toEqual(['p']);
	});
});
