/**
 * Units at the screen's edge. The engine and the API speak SI base units (K, Pa, m³/kg, kg/m³,
 * J/kg, J/(kg·K), kg, m³, kg/s, J, W); everything a person reads or types goes through here.
 *
 * Display systems: SI engineering (°C; kPa, MPa or bar; kJ/kg; kJ/(kg·K); m³/kg; kg/m³; kJ; kW;
 * kg/s) and US customary (°F; psi; ft³/lbm; lbm/ft³; Btu/lbm; Btu/(lbm·°R); lbm; ft³; Btu;
 * Btu/h or hp; lbm/h). Temperature differences show as K and °F.
 *
 * Pressure labels always say absolute or gauge: metric units carry a spaced suffix ("kPa a",
 * "kPa g", "MPa a", "bar g"), psi keeps the trade's "psia" / "psig". Gauge values use the
 * sheet's atmospheric pressure (`UnitPrefs.atmosphere`, default 101.325 kPa a).
 */
export * from './factors';
export {
	UNITS,
	SI_BASE,
	unitById,
	lookupUnit,
	unitsOf,
	normaliseUnitText,
	PROPERTY_QUANTITY,
	type Quantity,
	type PressureReference,
	type UnitDef
} from './catalogue';
export * from './prefs';
export * from './format';
export * from './parse';
