import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';

/**
 * The chart bench is a developer tool: a plain 404 when NODE_ENV is 'production' unless
 * STATEWRIGHT_DEV_TOOLS=1 (or true/yes/on) forces it on.
 */
export const load: PageServerLoad = () => {
	const production = process.env.NODE_ENV === 'production';
	const forced = /^(1|true|yes|on)$/i.test(process.env.STATEWRIGHT_DEV_TOOLS ?? '');
	if (production && !forced) error(404, { code: 'not-found', message: 'Not found' });
	return {};
};
