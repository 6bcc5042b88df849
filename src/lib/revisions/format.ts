import { displayUnit, formatNumber, formatQuantity, NBSP, type UnitPrefs } from '$lib/units';
import { phaseName } from '$lib/charts/describe';
import type { Phase } from '$lib/thermo/types';
import type { ValueChange } from './diff';

/** A compared value in the sheet's display units ("180.00 °C", "isobaric", "—" when absent). */
export function formatValue(c: ValueChange, side: 'before' | 'after', prefs: UnitPrefs): string {
	const v = c[side];
	if (v === null) return '—';
	if (typeof v === 'string') return c.key === 'phase' ? phaseName(v as Phase) : v;
	if (!c.quantity) return formatNumber(v, { sig: 5 });
	return formatQuantity(v, c.quantity, prefs).full;
}

/**
 * A difference in display units, signed. Temperatures differ in K (or °F as a difference);
 * pressures in the pressure unit without a or g (a difference is the same either way).
 */
export function formatDelta(c: ValueChange, prefs: UnitPrefs): string {
	if (c.delta === null || !c.changed) return '';
	const sign = c.delta > 0 ? '+' : '';
	if (!c.quantity) return `${sign}${formatNumber(c.delta, { sig: 4 })}`;
	if (c.quantity === 'temperature')
		return sign + formatQuantity(c.delta, 'temperatureDifference', prefs, { decimals: 2 }).full;
	if (c.quantity === 'pressure') {
		const unit = displayUnit('pressure', prefs, { reference: 'absolute' });
		const label = unit.label.replace(/\s?a$/, '').replace(/^psia$/, 'psi');
		return `${sign}${formatNumber(unit.fromSI(c.delta, 0), { sig: 4 })}${NBSP}${label}`;
	}
	const f = formatQuantity(c.delta, c.quantity, prefs, { sig: 4 });
	return sign + f.full;
}

/** Relative change in percent, where it means something (both sides non-zero numbers). */
export function formatRelative(c: ValueChange): string {
	if (
		!c.changed ||
		typeof c.before !== 'number' ||
		typeof c.after !== 'number' ||
		c.before === 0 ||
		c.quantity === 'temperature'
	)
		return '';
	const r = (c.after - c.before) / Math.abs(c.before);
	return `${r > 0 ? '+' : ''}${formatNumber(r * 100, { sig: 3 })} %`;
}
