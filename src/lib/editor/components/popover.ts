/**
 * A Svelte action for a popover hung from the right edge of a table cell: if that would put its
 * left edge outside the table's scroll box (or the window), it is shifted right until it fits, so
 * a message under a left-hand cell is never cut off.
 */
export function keepInside(node: HTMLElement): void {
	const fit = () => {
		node.style.transform = '';
		const box = node.getBoundingClientRect();
		const scroller = node.closest<HTMLElement>('[data-popover-bounds]');
		const bounds = scroller
			? scroller.getBoundingClientRect()
			: { left: 0, right: window.innerWidth };
		const left = Math.max(bounds.left, 0) + 4;
		const right = Math.min(bounds.right, window.innerWidth) - 4;
		let dx = 0;
		if (box.left < left) dx = left - box.left;
		if (box.right + dx > right) dx -= box.right + dx - right;
		if (dx !== 0) node.style.transform = `translateX(${Math.round(dx)}px)`;
	};
	fit();
}
