import { ThermoError, getFluid, type FluidInfo } from '$lib/thermo';
import { AppError } from '../errors';

/** The fluid named in a URL, or a 404 that lists the fluids. */
export function fluidFromParam(id: string): FluidInfo {
	try {
		return getFluid(id);
	} catch (e) {
		if (e instanceof ThermoError && e.code === 'unknown-fluid')
			throw new AppError(404, 'unknown-fluid', `${e.message} ${e.hint}`);
		throw e;
	}
}
