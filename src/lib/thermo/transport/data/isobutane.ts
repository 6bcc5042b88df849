/**
 * Isobutane's viscosity: Vogel, Küchenmeister & Bich (2000), "Viscosity Correlation for Isobutane over
 * Wide Ranges of the Fluid Region", Int. J. Thermophys. 21, 343–356 — the correlation CoolProp and
 * pychemqt both carry under that name (pychemqt also carries the newer Herrmann & Vogel (2018),
 * J. Phys. Chem. Ref. Data 47, 043103, in one copy only). Same form as propane's (data/propane.ts):
 * η = η0(T) + η0(T) B_η(T) ρ_n + Σ e_ij δ^i/T_r^j + f [δ/(δ0 − δ) − δ/δ0], δ0 = g1 (1 + g2 √T_r),
 * in μPa·s.
 *
 * Copies compared term by term: CoolProp/CoolProp dev/fluids/IsoButane.json (TRANSPORT.viscosity,
 * "Vogel-IJT-2000", commit ea27c639) and jjgomera/pychemqt lib/mEoS/iC4.py ("Vogel (2000)" visco1,
 * commit a26588c5): a_i, b_i, σ, ε/k, M, all twelve e_ij, f, g1, the reducing point 407.817 K and
 * 3.86 mol/dm³ agree digit for digit (CoolProp stores e_ij and f in Pa·s, 1e−6 × the μPa·s figures, and
 * its close-packed g2 = 2.35255150838 as g1 × 1.00596672174, the product of pychemqt's g1 and g2).
 * The paper's check values were not found in any public copy; the correlation is tested against
 * REFPROP 9.1 values quoted in CoolProp's tests (hydrocarbons.test.ts).
 *
 * Thermal conductivity (Perkins (2002), J. Chem. Eng. Data 47, 1272) is not built: its two public
 * copies (CoolProp IsoButane.json, pychemqt iC4.py "Perkins (2002)") agree on every coefficient but
 * not on the reducing point (407.85 K and 224.4 kg/m³ against 407.82 K and 3.86 mol/dm³), and no
 * published check value was found to settle it.
 */
export const isobutaneViscosity = {
	/** η0 = 0.021357 √(M T)/(σ² S*) μPa·s (M g/mol, σ nm), ln S* = Σ a_i (ln T*)^i, T* = T/(ε/k) */
	dilute: {
		chapman: 0.021357,
		M: 58.1222,
		sigmaNm: 0.46445,
		epsK: 307.55,
		a: [0.53583008, -0.4562963, 0.049911282]
	},
	/** B*_η = Σ b_i T*^t_i, B_η = N_A σ³ B*_η */
	initialDensity: {
		b: [
			-19.572881, 219.73999, -1015.3226, 2471.01251, -3375.1717, 2491.6597, -787.26086, 14.085455,
			-0.34664158
		],
		t: [0, -0.25, -0.5, -0.75, -1, -1.25, -1.5, -2.5, -5.5]
	},
	/** Δη_h = Σ e_ij δ^i/T_r^j + f [δ/(δ0 − δ) − δ/δ0], δ0 = g1 (1 + g2 √T_r); μPa·s */
	higherOrder: {
		Tc: 407.817,
		/** ρc, mol/dm³ × M: 3.86 mol/dm³ */
		rhoc: 3.86 * 58.1222,
		/** e_ij for i = 2…5 (rows), j = 0…2 (columns) */
		e: [
			[103.511763411, -312.670896234, 145.253750239],
			[-210.649894193, 386.269696509, -214.963015527],
			[112.58036092, -223.242033154, 119.114788598],
			[-18.19097459, 36.0438957232, -21.396018405]
		],
		f: 1940.3760699,
		g1: 2.33859774637,
		g2: 1.00596672174
	}
} as const;
