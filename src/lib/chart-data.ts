import type { FluidInfo, SaturationCurve } from '$lib/thermo';

/**
 * What a sheet's charts need of its fluid beyond the sheet itself, served once per fluid and
 * content version as an immutable resource (GET /api/v1/fluids/{id}/chart-data/{version}) instead
 * of inside every sheet page's HTML.
 */
export interface ChartData {
	fluid: string;
	/** the vapor dome (100 points a branch); null when the engine cannot trace it, with the reason */
	saturation: SaturationCurve | null;
	saturationError: string | null;
	/** every fluid, for the sheet's fluid picker */
	fluids: FluidInfo[];
}

/** Where a page finds its fluid's chart data: the content-versioned URL. */
export interface ChartDataRef {
	fluid: string;
	url: string;
}
