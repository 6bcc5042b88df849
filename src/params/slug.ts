import type { ParamMatcher } from '@sveltejs/kit';

/** Team URL names (see db/teams.ts SLUG_PATTERN): anything else is a 404 before any lookup. */
export const match: ParamMatcher = (param) => /^[a-z0-9](?:[a-z0-9]|-(?=[a-z0-9])){1,39}$/.test(param);
