/** The pieces of `describeTariffDiff`: pairing charges by label, and the changes of an energy charge. */
import {
	type EnergyInput,
	type TierInput,
	type TouSeasonInput,
	figureText,
	limitsMonths,
	listText,
	moneyText,
	monthsText,
	whenText
} from './rate-phrases';
import { energySentences, labelWithMonths, tiersText, touPeriodText } from './charge-sentences';

export interface Labelled {
	label: string;
}

export interface ListWords<T> {
	added: (item: T) => string;
	removed: (item: T) => string;
	changed: (before: T, after: T) => string[];
}

/** Pairs two versions' items by label (case and spaces ignored; repeated labels pair in order). */
export function diffList<T extends Labelled>(
	before: readonly T[],
	after: readonly T[],
	words: ListWords<T>
): string[] {
	const key = (item: T) => item.label.trim().toLowerCase();
	const left = [...before];
	const lines = after.flatMap((item) => {
		const i = left.findIndex((old) => key(old) === key(item));
		const [old] = i < 0 ? [] : left.splice(i, 1);
		return old ? words.changed(old, item) : [words.added(item)];
	});
	return [...lines, ...left.map(words.removed)];
}

const TYPE_WORDS = { flat: 'flat', tiered: 'tiered', tou: 'time-of-use' };

/** "first 500 kWh", "500 to 1,000 kWh", "above 1,000 kWh". */
function tierName(tiers: readonly TierInput[], i: number): string {
	const upto = tiers[i]?.uptoKwh ?? null;
	const from = i === 0 ? 0 : (tiers[i - 1]?.uptoKwh ?? 0);
	if (upto === null) return i === 0 ? 'all kWh' : `above ${figureText(from)} kWh`;
	return i === 0 ? `first ${figureText(upto)} kWh` : `${figureText(from)} to ${figureText(upto)} kWh`;
}

function seasonChanges(label: string, a: TouSeasonInput, b: TouSeasonInput, ca: string, cb: string) {
	const name = labelWithMonths(label, b.months);
	const lines = diffList(a.periods, b.periods, {
		added: (period) => `${name}: added ${touPeriodText(period, cb)}`,
		removed: (period) => `${name}: ${period.label} removed`,
		changed: (x, y) => [
			...(x.perKwh !== y.perKwh
				? [`${name}, ${y.label}: ${moneyText(x.perKwh, ca)} → ${moneyText(y.perKwh, cb)} per kWh`]
				: []),
			...(whenText(x.days, x.windows) !== whenText(y.days, y.windows)
				? [`${name}, ${y.label}: now ${whenText(y.days, y.windows)}`]
				: [])
		]
	});
	if (a.otherPerKwh !== b.otherPerKwh) {
		lines.push(
			`${name}, other times: ${moneyText(a.otherPerKwh, ca)} → ${moneyText(b.otherPerKwh, cb)} per kWh`
		);
	}
	return lines;
}

export function energyChanges(a: EnergyInput, b: EnergyInput, ca: string, cb: string): string[] {
	if (a.type !== b.type) {
		return [`${b.label}: now ${TYPE_WORDS[b.type]} (was ${TYPE_WORDS[a.type]})`, ...energySentences(b, cb)];
	}
	if (a.type === 'tou' && b.type === 'tou') {
		const seasonsA = a.seasons.map((season) => monthsText(season.months));
		const seasonsB = b.seasons.map((season) => monthsText(season.months));
		if (seasonsA.join('|') !== seasonsB.join('|')) {
			const now = `${b.label}: seasons now ${listText(seasonsB)} (were ${listText(seasonsA)})`;
			return [now, ...energySentences(b, cb)];
		}
		return b.seasons.flatMap((season, s) => {
			const old = a.seasons[s];
			return old ? seasonChanges(b.label, old, season, ca, cb) : [];
		});
	}
	if (a.type === 'tou' || b.type === 'tou') return [];
	const lines: string[] = [];
	if (monthsText(a.months ?? []) !== monthsText(b.months ?? [])) {
		const when = (months: readonly number[] | undefined) =>
			limitsMonths(months) ? `in ${monthsText(months)}` : 'all year';
		lines.push(`${b.label}: now applies ${when(b.months)} (was ${when(a.months)})`);
	}
	if (a.type === 'flat' && b.type === 'flat' && a.perKwh !== b.perKwh) {
		lines.push(`${b.label}: ${moneyText(a.perKwh, ca)} → ${moneyText(b.perKwh, cb)} per kWh`);
	}
	if (a.type === 'tiered' && b.type === 'tiered') {
		const bounds = (tiers: readonly TierInput[]) => tiers.map((tier) => tier.uptoKwh).join('|');
		if (bounds(a.tiers) !== bounds(b.tiers)) {
			lines.push(`${b.label}: tiers now ${tiersText(b.tiers, cb)}`);
		} else {
			b.tiers.forEach((tier, i) => {
				const old = a.tiers[i];
				if (!old || old.perKwh === tier.perKwh) return;
				const rates = `${moneyText(old.perKwh, ca)} → ${moneyText(tier.perKwh, cb)} per kWh`;
				lines.push(`${b.label}, ${tierName(b.tiers, i)}: ${rates}`);
			});
		}
	}
	return lines;
}
