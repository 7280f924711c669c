// The change trail in words: each changed field of a device or a scenario with its old and new value
// ("power 1,500 W → 90 W; schedule Always on → On 06:00–18:00, every day").
import type { OneOffCost, Schedule } from '$lib/calc';
import { powerText } from '$lib/components/equipment/readout-text';
import { figure, money } from '$lib/text/numbers';
import { activeMonthsText, scheduleText } from '../exports/device-words';

/** A field's old and new value, as `audit_event.changes` stores them. */
export type FieldChange = { from: unknown; to: unknown };

/** A value as JSON with its keys sorted, so a jsonb round trip (which reorders keys) is no change. */
export function canonical(value: unknown): string {
	return JSON.stringify(value ?? null, (_, v: unknown) =>
		v && typeof v === 'object' && !Array.isArray(v)
			? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)))
			: v
	);
}

/** The fields of two records whose values differ (key order and missing-versus-null aside). */
export function fieldChanges(
	before: Record<string, unknown>,
	after: Record<string, unknown>
): Record<string, FieldChange> {
	const changes: Record<string, FieldChange> = {};
	for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
		if (canonical(before[key]) !== canonical(after[key]))
			changes[key] = { from: before[key] ?? null, to: after[key] ?? null };
	}
	return changes;
}

const DEVICE_FIELDS: Record<string, string> = {
	name: 'name',
	category: 'kind',
	quantity: 'quantity',
	power: 'power',
	standbyWatts: 'standby',
	dutyPercent: 'duty cycle',
	schedule: 'schedule',
	months: 'months',
	purchaseCost: 'purchase',
	installCost: 'installation',
	lifeYears: 'life',
	maintenancePerYear: 'maintenance a year',
	inWater: 'in the water',
	outdoor: 'outdoors',
	notes: 'notes'
};

const SCENARIO_FIELDS: Record<string, string> = {
	name: 'name',
	description: 'description',
	status: 'status',
	tariff: 'tariff',
	oneOffCosts: 'one-off costs'
};

const plain = (value: unknown): string => {
	if (value === null || value === undefined || value === '') return 'none';
	if (typeof value === 'boolean') return value ? 'yes' : 'no';
	if (typeof value === 'number') return figure(value, 2);
	if (typeof value === 'string') return value.length > 60 ? `“${value.slice(0, 57)}…”` : `“${value}”`;
	return canonical(value);
};

function deviceValue(field: string, value: unknown, currency: string): string {
	if (value === null || value === undefined) return field === 'months' ? 'all year' : 'none';
	switch (field) {
		case 'power':
			return powerText(value);
		case 'schedule':
			return scheduleText(value as Schedule);
		case 'months':
			return activeMonthsText(value as number[]);
		case 'standbyWatts':
			return `${figure(value as number, 1)} W`;
		case 'dutyPercent':
			return `${figure(value as number, 1)} %`;
		case 'lifeYears':
			return `${figure(value as number, 1)} years`;
		case 'purchaseCost':
		case 'installCost':
		case 'maintenancePerYear':
			return money(value as number, currency);
		default:
			return plain(value);
	}
}

const STATUS_WORDS: Record<string, string> = {
	installed: 'installed (already paid for)',
	proposed: 'a proposal (bought now)'
};

function scenarioValue(field: string, value: unknown, currency: string): string {
	if (field === 'status') return STATUS_WORDS[String(value)] ?? plain(value);
	if (field === 'tariff') return value === null ? 'the site’s tariff' : String(value);
	if (field === 'oneOffCosts') {
		const costs = (value ?? []) as OneOffCost[];
		if (!costs.length) return 'none';
		return costs.map((c) => `${c.label} ${money(c.amount, currency)}`).join(', ');
	}
	return plain(value);
}

/** A device's changed fields in words, in the order a person reads a row. */
export function deviceChangeWords(changes: Record<string, FieldChange>, currency: string): string {
	const order = Object.keys(DEVICE_FIELDS);
	return Object.keys(changes)
		.sort((a, b) => (order.indexOf(a) + 1 || 99) - (order.indexOf(b) + 1 || 99))
		.map((field) => {
			const { from, to } = changes[field]!;
			const words = DEVICE_FIELDS[field] ?? field;
			return `${words} ${deviceValue(field, from, currency)} → ${deviceValue(field, to, currency)}`;
		})
		.join('; ');
}

/** A scenario's changed fields in words. */
export function scenarioChangeWords(changes: Record<string, FieldChange>, currency: string): string {
	return Object.entries(changes)
		.map(([field, { from, to }]) => {
			const words = SCENARIO_FIELDS[field] ?? field;
			return `${words} ${scenarioValue(field, from, currency)} → ${scenarioValue(field, to, currency)}`;
		})
		.join('; ');
}
