/** The version history's words for a demand charge: its price or tiers, its ratchet, then the rest. */
import { figureText, moneyText } from './rate-phrases';
import {
	type DemandInput,
	type RatchetInput,
	demandText,
	demandTiersText,
	ratchetLookText,
	ratchetText
} from './demand-sentences';

type DemandTier = NonNullable<DemandInput['tiers']>[number];

/** "first 100 kW", "100 to 250 kW", "above 250 kW". */
function demandTierName(tiers: readonly DemandTier[], i: number): string {
	const upto = tiers[i]?.uptoKw ?? null;
	const from = i === 0 ? 0 : (tiers[i - 1]?.uptoKw ?? 0);
	if (upto === null) return i === 0 ? 'all kW' : `above ${figureText(from)} kW`;
	return i === 0 ? `first ${figureText(upto)} kW` : `${figureText(from)} to ${figureText(upto)} kW`;
}

function priceChanges(a: DemandInput, b: DemandInput, ca: string, cb: string): string[] {
	const label = b.label;
	if (a.tiers && b.tiers) {
		const bounds = (tiers: readonly DemandTier[]) => tiers.map((tier) => tier.uptoKw).join('|');
		if (bounds(a.tiers) !== bounds(b.tiers)) {
			return [`${label}: demand tiers now ${demandTiersText(b.tiers, cb).replace(/,$/, '')}`];
		}
		return b.tiers.flatMap((tier, i) => {
			const old = a.tiers?.[i];
			if (!old || old.perKw === tier.perKw || !b.tiers) return [];
			const rates = `${moneyText(old.perKw, ca)} → ${moneyText(tier.perKw, cb)} per kW`;
			return [`${label}, ${demandTierName(b.tiers, i)}: ${rates}`];
		});
	}
	const price = (charge: DemandInput, currency: string) =>
		charge.tiers
			? demandTiersText(charge.tiers, currency).replace(/,$/, '')
			: `${moneyText(charge.perKw ?? 0, currency)} per kW`;
	if (a.tiers || b.tiers) return [`${label}: now ${price(b, cb)} (was ${price(a, ca)})`];
	if ((a.perKw ?? 0) === (b.perKw ?? 0)) return [];
	return [`${label}: ${moneyText(a.perKw ?? 0, ca)} → ${moneyText(b.perKw ?? 0, cb)} per kW`];
}

function ratchetChanges(label: string, a?: RatchetInput, b?: RatchetInput): string[] {
	if (!a && !b) return [];
	if (!b) return [`${label}: ratchet removed`];
	if (!a) return [`${label}: now ${ratchetText(b)}`];
	const lines: string[] = [];
	const look = ratchetLookText(b);
	if (a.percent !== b.percent) {
		lines.push(
			`${label}: ratchet ${figureText(a.percent)}% → ${figureText(b.percent)}% of the highest peak of ${look}`
		);
	}
	if (ratchetLookText(a) !== look) {
		lines.push(`${label}: ratchet now looks at ${look} (was ${ratchetLookText(a)})`);
	}
	return lines;
}

/**
 * What changed in a demand charge, one line each: "Demand: $8.00 → $9.00 per kW", "Demand, first
 * 100 kW: $10.00 → $12.00 per kW", "Demand: ratchet 80% → 75% of the highest peak of …"; a change of
 * interval, days, windows or months reads "Demand: now …" with the whole charge.
 */
export function demandChanges(a: DemandInput, b: DemandInput, ca: string, cb: string): string[] {
	const lines = [...priceChanges(a, b, ca, cb), ...ratchetChanges(b.label, a.ratchet, b.ratchet)];
	const samePrices: DemandInput = { ...a, perKw: b.perKw, tiers: b.tiers, ratchet: b.ratchet };
	if (demandText(samePrices, cb) !== demandText(b, cb)) lines.push(`${b.label}: now ${demandText(b, cb)}`);
	return lines;
}
