/** A file-name-safe version of a sheet name ("V-204 fire case" → "v-204-fire-case"). */
export function fileStem(name: string): string {
	return (
		name
			.normalize('NFKD')
			.replace(/[\u0300-\u036f]/g, '')
			.replace(/[^A-Za-z0-9]+/g, '-')
			.replace(/^-+|-+$/g, '')
			.slice(0, 60)
			.toLowerCase() || 'sheet'
	);
}

/** Offers a blob (or text) as a download with this file name. */
export function download(
	data: Blob | string,
	filename: string,
	type = 'text/plain;charset=utf-8'
): void {
	const blob = typeof data === 'string' ? new Blob([data], { type }) : data;
	const url = URL.createObjectURL(blob);
	const a = document.createElement('a');
	a.href = url;
	a.download = filename;
	a.rel = 'noopener';
	document.body.appendChild(a);
	a.click();
	a.remove();
	setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
