/**
 * Background lines of water by IAPWS-IF97: the IAPWS-95 isolines (solvers/isolines.ts) with each
 * point re-fixed by IF97 from the line's value and the point's own progress coordinate, as a leg's
 * points are (path.ts): isobar (P, h), isotherm (T, v), isochore (v, T), isentrope (s, P), isenthalp
 * (h, P), quality line (T, x). (P, h) and (P, s) go straight to the basic equations, (T, v) in region
 * 3 straight to Eq. 28 where it can be. A point outside IF97's range (above 100 MPa; above 50 MPa
 * beyond 1073.15 K; a quality line above 643.15 K, where the IF97 dome stops, dome.ts) is left out,
 * so a line stops where IF97 stops. No stretching between anchors as on a leg: a background line has
 * no ends to meet; each point is IF97's state at the IAPWS-95 point's coordinate.
 */
import { ThermoError } from '../errors.ts';
import type { Isoline, IsolineKind, IsolinePoint, State } from '../types.ts';
import { if97FixFrom } from './fix.ts';
import { region3Direct } from './path.ts';
import { IF97_DOME_TOP } from './dome.ts';
import { if97StatePh, if97StatePs } from './state.ts';

function refix(kind: IsolineKind, value: number, p: IsolinePoint): State {
	const seed = { T: p.T, P: p.P };
	switch (kind) {
		case 'isobar':
			return if97StatePh(value, p.h);
		case 'isentrope':
			return if97StatePs(p.P, value);
		case 'isenthalp':
			return if97StatePh(p.P, value);
		case 'isotherm':
			return region3Direct(value, p.v) ?? if97FixFrom({ T: value, v: p.v }, seed);
		case 'isochore':
			return region3Direct(p.T, value) ?? if97FixFrom({ T: p.T, v: value }, seed);
		case 'quality':
			// as the dome (dome.ts): not above 643.15 K, where Eq. 28 no longer gives the saturated densities well
			if (p.T > IF97_DOME_TOP)
				throw new ThermoError('out-of-range', 'Above the IF97 dome’s top.', 'Leave the point out.');
			return if97FixFrom({ T: p.T, x: value }, seed);
	}
}

/** The lines re-fixed by IF97 (module comment); points IF97 cannot give are left out. */
export function if97IsolinesOf(lines: readonly Isoline[]): Isoline[] {
	return lines.map((line) => {
		const points: IsolinePoint[] = [];
		for (const p of line.points) {
			try {
				const st = refix(line.kind, line.value, p);
				points.push({ T: st.T, P: st.P, v: st.v, h: st.h, s: st.s });
			} catch (e) {
				if (!(e instanceof ThermoError)) throw e;
			}
		}
		return { ...line, points };
	});
}
