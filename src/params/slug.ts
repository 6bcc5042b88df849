import type { ParamMatcher } from '@sveltejs/kit';
import { SLUG_PATTERN } from '../lib/slug';

/** Team URL names: anything else is a 404 before any lookup. */
export const match: ParamMatcher = (param) => SLUG_PATTERN.test(param);
