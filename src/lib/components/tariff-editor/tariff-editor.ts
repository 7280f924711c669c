import { parseRequest, type TariffInput, tariffSchema } from '$lib/calc';
import type { FieldIssue } from '$lib/components/fields/field-issues';
import type { NumberDraft } from '$lib/components/fields/number-text';

/** One problem at a dotted path relative to the tariff ("energyCharges.0.tiers.1.uptoKwh"). */
export type EditorIssue = FieldIssue;

/**
 * Writes a draft into a charge. The tariff's type says "number" because that is the valid shape; while
 * a person is typing, a field may hold nothing or the text they typed, which the schema reports.
 */
export function writeDraft<T extends object>(target: T, key: keyof T & string, draft: NumberDraft): void {
	(target as Record<string, unknown>)[key] = draft;
}

const FIXED_UNION = 'Give a fixed charge per month, per day or per year';

/**
 * Every problem with the tariff as the editor holds it, at dotted paths. A fixed charge whose one
 * amount box is empty fails both ways of the schema's union equally, so zod reports the union; here it
 * is reported at the empty box instead, which is what the person must fill in.
 */
export function tariffIssues(value: TariffInput): EditorIssue[] {
	const result = parseRequest(tariffSchema, value);
	if (result.success) return [];
	return result.error.issues.map((issue) => {
		const match = /^fixedCharges\.(\d+)$/.exec(issue.path);
		if (!match || !issue.message.startsWith(FIXED_UNION)) return issue;
		const charge = value.fixedCharges?.[Number(match[1])];
		if (!charge) return issue;
		const keys = (['perMonth', 'perDay', 'perYear'] as const).filter((key) => key in charge);
		const key = keys.length === 1 ? keys[0] : undefined;
		if (!key || charge[key] !== undefined) return issue;
		return { path: `${issue.path}.${key}`, message: `${FIELD_NAMES[key]} is required` };
	});
}

/** The element id of the control for a path: "energyCharges.0.perKwh" → "te-energyCharges-0-perKwh". */
export function fieldId(path: string): string {
	return path === '' ? 'te-tariff' : `te-${path.replaceAll('.', '-')}`;
}

/** The ids to try, nearest first, when jumping to a path whose exact control may not exist. */
export function fieldIdsToward(path: string): string[] {
	const parts = path === '' ? [] : path.split('.');
	return parts.map((_, i) => fieldId(parts.slice(0, parts.length - i).join('.'))).concat(fieldId(''));
}

const ITEM_NAMES: Record<string, string> = {
	fixedCharges: 'Fixed charge',
	energyCharges: 'Energy charge',
	demandCharges: 'Demand charge',
	riders: 'Rider',
	taxes: 'Tax',
	seasons: 'season',
	periods: 'period',
	tiers: 'tier',
	windows: 'window',
	weekendWindows: 'weekend window'
};

/** Where a path is, in words for the summary: "energyCharges.0.seasons.1.months.2" → "Energy charge 1 · season 2". */
export function describePath(path: string): string {
	const parts = path.split('.');
	const words: string[] = [];
	parts.forEach((part, i) => {
		const name = ITEM_NAMES[part];
		const next = parts[i + 1];
		if (name && next !== undefined && /^\d+$/.test(next)) words.push(`${name} ${Number(next) + 1}`);
	});
	return words.join(' · ') || 'Tariff';
}

/** The words for a field key, as its box is labelled; list keys name the whole list. */
const FIELD_NAMES: Record<string, string> = {
	currency: 'Currency',
	holidaysAsWeekends: 'Holidays priced like weekends',
	minimumMonthly: 'Minimum per month',
	minimumPerDay: 'Minimum per day',
	minimumPerYear: 'Minimum per year',
	perYear: 'Per year',
	tiersPer: 'Tier limits count',
	uptoKw: 'Up to kW',
	ratchet: 'Ratchet',
	monthsBack: 'Months back',
	tierLimitsKwh: 'Tier limits',
	abovePerKwh: 'Prices above the tier limits',
	otherAbovePerKwh: 'Prices above the tier limits at all other hours',
	fixedCharges: 'Fixed charges',
	energyCharges: 'Energy charges',
	demandCharges: 'Demand charges',
	riders: 'Riders',
	taxes: 'Taxes',
	seasons: 'Seasons',
	periods: 'Periods',
	tiers: 'Tiers',
	windows: 'Hours',
	weekendWindows: 'Other hours at weekends',
	label: 'Name',
	type: 'Kind of charge',
	perMonth: 'Per month',
	perDay: 'Per day',
	perKwh: 'Per kWh',
	perKw: 'Per kW',
	otherPerKwh: 'Per kWh at all other hours',
	uptoKwh: 'Up to kWh',
	percent: 'Percent',
	months: 'Months',
	days: 'Days',
	intervalMinutes: 'Interval',
	start: 'Start',
	end: 'End'
};

/**
 * The field a path points at, in words for a summary that names fields without repeating their
 * messages: "energyCharges.0.tiers.1.uptoKwh" → "Energy charge 1 · tier 2 · Up to kWh",
 * "currency" → "Currency". Never the raw path.
 */
export function describeField(path: string): string {
	const parts = path.split('.');
	const place = describePath(path);
	const leaf = [...parts].reverse().find((part) => !/^\d+$/.test(part));
	const next = leaf === undefined ? undefined : parts[parts.lastIndexOf(leaf) + 1];
	const isItem = leaf !== undefined && ITEM_NAMES[leaf] !== undefined && next !== undefined;
	const name = leaf === undefined || isItem ? undefined : FIELD_NAMES[leaf];
	if (!name) return place;
	return place === 'Tariff' ? name : `${place} · ${name}`;
}

/** Paths no control of the editor shows messages for (the whole tariff, the holidays checkbox). */
const NOT_AT_A_FIELD = new Set(['', 'holidaysAsWeekends']);

/**
 * The editor's summary: each field that needs attention once, in words. Messages show at their fields;
 * the summary repeats a message only where no field shows it.
 */
export function summaryEntries(issues: readonly EditorIssue[]) {
	const entries = new Map<string, { path: string; words: string; messages: string[] }>();
	for (const issue of issues) {
		const entry = entries.get(issue.path) ?? {
			path: issue.path,
			words: describeField(issue.path),
			messages: []
		};
		if (NOT_AT_A_FIELD.has(issue.path)) entry.messages.push(issue.message);
		entries.set(issue.path, entry);
	}
	return [...entries.values()];
}

/** Months a list's issues point at by position ("….months.2" is the third month listed). */
export function flaggedMonths(
	issues: readonly EditorIssue[],
	path: string,
	months: readonly number[]
): Set<number> {
	const flagged = new Set<number>();
	for (const issue of issues) {
		const rest = issue.path.startsWith(`${path}.`) ? issue.path.slice(path.length + 1) : '';
		const month = /^\d+$/.test(rest) ? months[Number(rest)] : undefined;
		if (month !== undefined) flagged.add(month);
	}
	return flagged;
}
