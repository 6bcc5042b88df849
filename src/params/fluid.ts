import type { ParamMatcher } from '@sveltejs/kit';

/** Fluid ids and aliases look like this; whether one exists is the route's answer (404 unknown-fluid). */
export const match: ParamMatcher = (param) => /^[A-Za-z0-9][A-Za-z0-9_-]{0,39}$/.test(param);
