/** 1 standard atmosphere = 101 325 Pa exactly. 10th CGPM (1954); NIST SP 811 (2008), App. B.8. */
export const STANDARD_ATMOSPHERE = 101325;

/** Atmospheric pressure assumed for gauge readings unless a sheet or import gives its own, Pa. */
export const DEFAULT_ATMOSPHERE = STANDARD_ATMOSPHERE;
