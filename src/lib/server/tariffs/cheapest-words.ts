// Why the cheapest tariff is cheapest, in plain words built from the priced figures.
import { money, moneyPerKwh, percentText } from '$lib/text/numbers';
import type { RankedTariff } from './cheapest-rank';
import { OTHER_HOURS, type TouShare } from './cheapest-shares';

const priceText = (share: TouShare, currency: string) =>
	share.minPerKwh === share.maxPerKwh
		? `${moneyPerKwh(share.minPerKwh, currency)} per kWh`
		: `${moneyPerKwh(share.minPerKwh, currency)} to ${moneyPerKwh(share.maxPerKwh, currency)} per kWh, by season`;

function shareSentence(share: TouShare, currency: string): string {
	const where = share.label === OTHER_HOURS ? 'in the hours no period names' : `in its ${share.label} hours`;
	return `${percentText(share.share)} of your use falls ${where}, which this tariff prices at ${priceText(share, currency)} (before tiers).`;
}

/**
 * Sentences for the top tariff: what it costs against the current one, where the year's kWh fall among
 * its time-of-use periods and at what price, its fixed and demand charges a year against the current
 * tariff's. Every figure comes from the ranking, none is restated from the tariff by hand.
 */
export function cheapestWords(
	top: RankedTariff,
	current: RankedTariff | null,
	shares: readonly TouShare[],
	currency: string
): string[] {
	const words: string[] = [];
	const cost = money(top.annualCost, currency);
	if (top.current) words.push(`Your current tariff, ${top.name}, is already the cheapest at ${cost} a year.`);
	else if (current && top.differenceToCurrent !== null)
		words.push(
			`${top.name} would have cost ${cost} for the year, ${money(-top.differenceToCurrent, currency)} less than your current tariff, ${current.name}.`
		);
	else words.push(`${top.name} would have cost ${cost} for the year, the least of the tariffs compared.`);
	const byShare = [...shares].sort((a, b) => b.share - a.share);
	for (const share of byShare) words.push(shareSentence(share, currency));
	if (!shares.length) words.push('It charges the same for a kWh at every hour of the day.');
	const vs = (pickCost: (r: RankedTariff) => number) =>
		current && !top.current ? ` against ${money(pickCost(current), currency)} on your current tariff` : '';
	words.push(`Its fixed charges come to ${money(top.fixedCost, currency)} a year${vs((r) => r.fixedCost)}.`);
	words.push(
		`Its demand charges come to ${money(top.demandCost, currency)} a year${vs((r) => r.demandCost)}.`
	);
	return words;
}
