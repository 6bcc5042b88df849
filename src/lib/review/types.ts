import type { DesignLimits as ChartLimits } from '../charts/types';
import type { FluidInfo, Isoline, SaturationCurve } from '../thermo/types';

/** What a read-only chart needs besides the path: the dome, background isolines, design limits. */
export interface ChartFrame {
	fluid: FluidInfo;
	saturation: SaturationCurve;
	isolines: { tv: Isoline[]; pv: Isoline[] };
	limits: ChartLimits;
}
