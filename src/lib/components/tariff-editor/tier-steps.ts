/**
 * A list of tiers in the editor, energy's in kWh or demand's in kW: the keys of a tier's limit and price,
 * the step a new tier adds, and the words the list is introduced with.
 */
export interface TierScale<U extends string = string, P extends string = string> {
	unit: string;
	/** The key of a tier's upper limit, and of its price. */
	upto: U;
	per: P;
	/** How far above the highest limit a new tier ends. */
	step: number;
	intro: string;
	add: string;
}

export const ENERGY_TIERS: TierScale<'uptoKwh', 'perKwh'> = {
	unit: 'kWh',
	upto: 'uptoKwh',
	per: 'perKwh',
	step: 500,
	intro:
		"A tier prices the month's kWh in steps: each tier's rate covers the kWh above the tier before it, up to its own limit.",
	add: 'Add a tier'
};

export const DEMAND_TIERS: TierScale<'uptoKw', 'perKw'> = {
	unit: 'kW',
	upto: 'uptoKw',
	per: 'perKw',
	step: 100,
	intro: "Each tier's price per kW covers the billing kW above the tier before it, up to its own limit.",
	add: 'Add a demand tier'
};

/** A tier as the editor holds it: its limit (null: and above) and its price. */
export type TierOf<U extends string, P extends string> = Record<U, unknown> & Record<P, unknown>;

/**
 * Adds a tier just before the open-ended last one, ending a step above the last closed tier (a round
 * number a person then types over), at the price of the tier before it.
 */
export function insertTier<U extends string, P extends string>(
	tiers: TierOf<U, P>[],
	scale: TierScale<U, P>
): void {
	const closed = tiers.map((tier) => tier[scale.upto]).filter((limit) => typeof limit === 'number');
	const top = closed.length ? Math.max(...(closed as number[])) : 0;
	const before = tiers[tiers.length - 2] ?? tiers[tiers.length - 1];
	const tier = { [scale.upto]: top + scale.step, [scale.per]: before?.[scale.per] ?? 0 } as TierOf<U, P>;
	if (tiers.length === 0) tiers.push({ [scale.upto]: null, [scale.per]: 0 } as TierOf<U, P>);
	tiers.splice(tiers.length - 1, 0, tier);
}

/** Removes a tier; when the last goes, the one before becomes open-ended ("and above"). */
export function removeTier<U extends string, P extends string>(
	tiers: TierOf<U, P>[],
	index: number,
	scale: TierScale<U, P>
): void {
	const wasLast = index === tiers.length - 1;
	tiers.splice(index, 1);
	const last = tiers[tiers.length - 1];
	if (wasLast && last) last[scale.upto] = null as TierOf<U, P>[U];
}
