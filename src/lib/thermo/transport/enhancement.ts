/**
 * The simplified Olchowy–Sengers critical enhancement of the thermal conductivity (forms.ts) with
 * cp, cv and (∂ρ/∂p)_T taken at the state (T, ρ) and at the correlation's reference temperature
 * (Tref, ρ) from this engine's own equation of state of the fluid. Every conductivity correlation
 * with that enhancement calls this one function.
 */
import { evalPoint, Point } from '../properties.ts';
import { getCompiledFluid } from '../registry.ts';
import { olchowySengers, type OlchowySengers } from './forms.ts';

const point = new Point();
const pointRef = new Point();

/** Δλ_c in W/(m·K) at T (K), ρ (kg/m³) and η (Pa·s); 0 where the fluid is not stable at either point. */
export function criticalEnhancement(
	fluid: string,
	c: OlchowySengers,
	T: number,
	rho: number,
	mu: number
): number {
	if (!(rho > 0) || !(mu > 0)) return 0;
	const fl = getCompiledFluid(fluid);
	evalPoint(fl, T, rho, point, 2);
	evalPoint(fl, c.Tref, rho, pointRef, 2);
	if (!(point.dPdrho > 0) || !(pointRef.dPdrho > 0)) return 0;
	return olchowySengers(c, {
		T,
		rho,
		cp: point.cp,
		cv: point.cv,
		mu,
		drhodP: 1 / point.dPdrho,
		drhodPref: 1 / pointRef.dPdrho
	});
}
