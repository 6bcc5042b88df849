import { describe, expect, it } from 'vitest';
import { History } from './history';

describe('History (undo/redo stack)', () => {
	it('undoes and redoes edits in order', () => {
		const h = new History('a');
		h.push('b');
		h.push('c');
		expect(h.present).toBe('c');
		expect(h.undo()).toBe('b');
		expect(h.undo()).toBe('a');
		expect(h.undo()).toBeNull();
		expect(h.present).toBe('a');
		expect(h.redo()).toBe('b');
		expect(h.redo()).toBe('c');
		expect(h.redo()).toBeNull();
		expect(h.depth).toEqual({ undo: 2, redo: 0 });
	});

	it('a new edit after an undo drops the redo branch', () => {
		const h = new History(1);
		h.push(2);
		h.push(3);
		h.undo();
		expect(h.canRedo).toBe(true);
		h.push(4);
		expect(h.canRedo).toBe(false);
		expect(h.undo()).toBe(2);
		expect(h.redo()).toBe(4);
	});

	it('an edit equal to the present is not recorded', () => {
		const h = new History({ v: 1 }, { same: (a, b) => JSON.stringify(a) === JSON.stringify(b) });
		expect(h.push({ v: 1 })).toBe(false);
		expect(h.canUndo).toBe(false);
		expect(h.push({ v: 2 })).toBe(true);
		expect(h.canUndo).toBe(true);
	});

	it('keeps at most `limit` steps, dropping the oldest', () => {
		const h = new History(0, { limit: 3 });
		for (let i = 1; i <= 10; i++) h.push(i);
		expect(h.depth.undo).toBe(3);
		expect([h.undo(), h.undo(), h.undo(), h.undo()]).toEqual([9, 8, 7, null]);
	});

	it('reset forgets both stacks', () => {
		const h = new History('a');
		h.push('b');
		h.undo();
		h.reset('z');
		expect(h.present).toBe('z');
		expect(h.canUndo || h.canRedo).toBe(false);
	});
});
