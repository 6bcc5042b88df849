import type { ParamMatcher } from '@sveltejs/kit';

export const match: ParamMatcher = (param) => /^[1-9][0-9]{0,15}$/.test(param);
