/** JSON with object keys sorted at every level: equal content gives equal text whatever the key order. */
export function canonicalJson(value: unknown): string {
	return JSON.stringify(value, (_k, v: unknown) =>
		v && typeof v === 'object' && !Array.isArray(v)
			? Object.fromEntries(
					Object.keys(v as Record<string, unknown>)
						.sort()
						.map((k) => [k, (v as Record<string, unknown>)[k]])
				)
			: v
	);
}

/** Whether two documents hold the same content (key order aside). */
export function sameContent(a: unknown, b: unknown): boolean {
	return canonicalJson(a) === canonicalJson(b);
}
