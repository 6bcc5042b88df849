/**
 * Surface tension on the saturation line, σ = Σ σ_i (1 − T/Tc)^n_i: Mulero, Cachadiña & Parra (2012),
 * "Recommended Correlations for the Surface Tension of Common Fluids", J. Phys. Chem. Ref. Data 41,
 * 043105 (its table of recommended coefficients; Tc is the paper's for each fluid).
 * Copies compared: CoolProp dev/fluids/<fluid>.json (ANCILLARIES.surface_tension, BibTeX
 * Mulero-JPCRD-2012) and pychemqt lib/mEoS/<fluid>.py (`_surface`; for propane, methane and R-32 the
 * Mulero (2012) values of pychemqt commit 07e0c39e, which later moved those fluids to other papers).
 * Every term below agrees between the two copies.
 * Not here: water (IAPWS R1-76(2014), water.ts); R-1234ze(E), whose copies (CoolProp, Mulero &
 * Cachadiña 2014) disagree on the sign of the second term (+0.8247 against −0.8247 N/m), so it is
 * left absent until the paper itself is read. A third copy, CalebBell/chemicals
 * chemicals/Interface/MuleroCachadinaParameters.tsv (commit 82faef90), has −0.8247 like pychemqt's,
 * but none of the three prints a check value, and the two signs differ by 0.08 mN/m at 300 K and
 * 1.4 mN/m (10 %) at 253 K, so two copies against one does not settle it.
 */
import type { TensionSum } from '../forms.ts';

export const muleroTension: Record<string, TensionSum> = {
	ammonia: { Tc: 405.4, sigma: [0.1028, -0.09453], n: [1.211, 5.585] },
	'carbon-dioxide': { Tc: 304.128, sigma: [0.07863], n: [1.254] },
	r134a: { Tc: 374.21, sigma: [0.05801], n: [1.241] },
	nitrogen: { Tc: 126.192, sigma: [0.02898], n: [1.246] },
	propane: { Tc: 369.89, sigma: [0.05334, -0.01748], n: [1.235, 4.404] },
	r32: { Tc: 351.255, sigma: [0.07147], n: [1.246] },
	argon: { Tc: 150.687, sigma: [0.037], n: [1.25] },
	methane: { Tc: 190.564, sigma: [0.03825, -0.006024, -0.0007065], n: [1.191, 5.422, 0.6161] },
	isobutane: { Tc: 407.81, sigma: [-0.01639, 0.06121], n: [2.102, 1.304] },
	hydrogen: {
		Tc: 33.145,
		sigma: [-1.4165, 0.746383, 0.675625],
		n: [0.63882, 0.659804, 0.619149]
	},
	r1234yf: { Tc: 367.85, sigma: [0.06274], n: [1.394] },
	oxygen: { Tc: 154.581, sigma: [0.03843], n: [1.225] }
};

export const muleroSource = 'Mulero, Cachadiña & Parra (2012), J. Phys. Chem. Ref. Data 41, 043105';
