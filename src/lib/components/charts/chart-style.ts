import type { ChargeKind, EQUIPMENT_CATEGORIES } from '$lib/calc';
import { figure, moneyFormat } from '$lib/text/numbers';

/**
 * How the scenario charts look: names, colours and number formats. Runrate's categorical colours for the scenario charts, drawn from the app's palette (reed, ink,
 * sun, the rate ramp's straw and amber) plus two water blues and a violet of our own. Neighbours in
 * each stack differ in lightness as well as hue, so adjacent bands stay apart in grey or bright sun;
 * white strokes between segments do the rest.
 */

/** A kind of equipment, as the charts group and colour it. */
export type Category = (typeof EQUIPMENT_CATEGORIES)[number];

/** The order charges stack in, bottom to top, and the legend's order. */
export const CHARGE_KINDS: readonly ChargeKind[] = ['fixed', 'energy', 'demand', 'rider', 'minimum', 'tax'];

export const KIND_NAMES: Record<ChargeKind, string> = {
	fixed: 'Fixed charges',
	energy: 'Energy',
	demand: 'Demand',
	rider: 'Riders',
	minimum: 'Minimum bill top-up',
	tax: 'Taxes'
};

export const KIND_COLOURS: Record<ChargeKind, string> = {
	fixed: '#3c4f57',
	energy: '#2f7a62',
	demand: '#c58a2c',
	rider: '#b3d3b9',
	minimum: '#d3c67c',
	tax: '#7c4a0f'
};

export const CATEGORY_NAMES: Record<Category, string> = {
	'water-pump': 'Water pumps',
	'air-pump': 'Air pumps',
	aerator: 'Aerators',
	lighting: 'Lighting',
	heater: 'Heaters',
	chiller: 'Chillers',
	uv: 'UV sterilisers',
	fan: 'Fans',
	controls: 'Controls',
	other: 'Other'
};

export const CATEGORY_COLOURS: Record<Category, string> = {
	'water-pump': '#2f7a62',
	'air-pump': '#5b8fa8',
	aerator: '#a9cbd9',
	lighting: '#d3c67c',
	heater: '#c58a2c',
	chiller: '#3c4f57',
	uv: '#7d6aa8',
	fan: '#b3d3b9',
	controls: '#6a7b82',
	other: '#c9d1ce'
};

/** The one colour of the cost-by-device bars. */
export const DEVICE_BAR_COLOUR = '#2f7a62';

/**
 * Money as a bill shows it, in the currency's own minor digits ("$12.50"), or compact for an axis
 * ("$1.2K"). A malformed code (an unsaved draft) shows as typed before the figure.
 */
export function moneyLabel(amount: number, currency: string, compact = false): string {
	const format = moneyFormat(currency.trim().toUpperCase(), compact ? 'compact' : 'minor');
	return format ? format.format(amount) : `${currency} ${figure(amount, 2)}`;
}

/** A figure with at most `digits` decimals: 1234.5 is "1,234.5". */
export function figureLabel(value: number, digits = 1): string {
	return value.toLocaleString('en-US', { maximumFractionDigits: digits });
}

/** The axes' figures and names: small, soft, not bold (layerchart's defaults are bold). */
export const TICK_LABEL = { class: 'fill-ink-soft text-xs font-normal' };

/** The grid lines a value axis draws across the chart. */
export const AXIS_GRID = { class: 'stroke-mist-line' };
