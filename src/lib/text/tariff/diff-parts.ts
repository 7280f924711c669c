/** The pieces of `describeTariffDiff`: pairing charges by label, and the changes of an energy charge. */
import {
	type EnergyInput,
	type TierInput,
	figureText,
	limitsMonths,
	listText,
	moneyText,
	monthsText
} from './rate-phrases';
import { energySentences, tiersText } from './charge-sentences';
import { type TiersPer, perDayWords } from './tou-sentences';
import { seasonChanges } from './season-diff';

export { type Labelled, type ListWords, diffList } from './pair-by-label';

const TYPE_WORDS = { flat: 'flat', tiered: 'tiered', tou: 'time-of-use' };

/** "first 500 kWh", "500 to 1,000 kWh", "above 1,000 kWh" (" a day" when bounds are per day). */
function tierName(tiers: readonly TierInput[], i: number, per: TiersPer): string {
	const upto = tiers[i]?.uptoKwh ?? null;
	const from = i === 0 ? 0 : (tiers[i - 1]?.uptoKwh ?? 0);
	const day = perDayWords(per);
	if (upto === null) return i === 0 ? 'all kWh' : `above ${figureText(from)} kWh${day}`;
	return i === 0
		? `first ${figureText(upto)} kWh${day}`
		: `${figureText(from)} to ${figureText(upto)} kWh${day}`;
}

const perWords = (per: TiersPer) => (per === 'day' ? 'per day' : 'per billing period');

/**
 * What changed in an energy charge of the same label, one line per change; a change of type, of
 * seasons or of whether tier bounds are per day restates the whole charge after one line saying so.
 */
export function energyChanges(a: EnergyInput, b: EnergyInput, ca: string, cb: string): string[] {
	if (a.type !== b.type) {
		return [`${b.label}: now ${TYPE_WORDS[b.type]} (was ${TYPE_WORDS[a.type]})`, ...energySentences(b, cb)];
	}
	const perA = a.type === 'flat' ? undefined : (a.tiersPer ?? 'period');
	const perB = b.type === 'flat' ? undefined : (b.tiersPer ?? 'period');
	if (perA !== perB) {
		const now = `${b.label}: tier bounds now ${perWords(perB)} (were ${perWords(perA)})`;
		return [now, ...energySentences(b, cb)];
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
			return old ? seasonChanges(b.label, old, season, [ca, cb], b.tiersPer) : [];
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
				lines.push(`${b.label}, ${tierName(b.tiers, i, b.tiersPer)}: ${rates}`);
			});
		}
	}
	return lines;
}
