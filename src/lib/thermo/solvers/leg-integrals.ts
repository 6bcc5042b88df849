/**
 * Boundary work along a leg's pieces: adaptive Gauss–Kronrod (quadrature.ts) of P·v in ln v, the
 * exact P·Δv on an isothermal two-phase piece, and −∫v·(dPs/dT) dT by Clapeyron on an isentropic
 * two-phase piece (w = Δ(Pv) + wShaft).
 */
import type { Curve, CPt } from './leg-curve.ts';
import type { Piece, SP } from './leg-points.ts';
import { integrate } from './quadrature.ts';

/** Boundary work w = ∫P dv along the leg, J/kg (isothermal, isentropic, polytropic legs). */
export function integrals(curve: Curve, pieces: Piece[], sampled: SP[]): number {
	let w = 0;
	pieces.forEach((pc, i) => {
		if (pc.from === pc.to) return;
		const mine = sampled.filter((s) => s.piece === i);
		const guess = (t: number) => {
			let best = mine[0].c,
				d = Infinity;
			for (const s of mine) {
				const e = Math.abs(s.t - t);
				if (e < d) {
					d = e;
					best = s.c;
				}
			}
			return best;
		};
		const Pv = (c: CPt) => c.P / c.rho;
		// a two-phase piece at a fixed pressure (isothermal): P·Δv exactly
		if (pc.seg.dome && curve.pc.domeWork === 'exact') {
			w += pc.A.P * (1 / pc.B.rho - 1 / pc.A.rho);
			return;
		}
		let scaleAbs = 0;
		for (const s of mine) scaleAbs = Math.max(scaleAbs, Math.abs(Pv(s.c)));
		const f = (t: number) => curve.integrand(pc.seg, t, guess(t));
		// a two-phase piece integrated as shaft work (isentropic): w = Δ(Pv) + wShaft
		if (pc.seg.dome && curve.pc.domeWork === 'shaft') {
			let dPsv = 0;
			for (const s of mine) dPsv = Math.max(dPsv, Math.abs(s.c.P / s.c.rho / s.c.T));
			const ws = integrate(f, pc.from, pc.to, 1e-10, 1e-9 * dPsv * Math.abs(pc.to - pc.from)).value;
			w += Pv(pc.B) - Pv(pc.A) + ws;
			return;
		}
		w += integrate(f, pc.from, pc.to, 1e-10, 1e-9 * scaleAbs * Math.abs(pc.to - pc.from)).value;
	});
	return w;
}
