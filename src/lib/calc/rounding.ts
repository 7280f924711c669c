/**
 * Money to cents, half away from zero (0.125 → 0.13, −0.125 → −0.13), the way a bill rounds each
 * charge line. The scaled amount is first read back at 15 significant digits so that a value such as
 * 1.005, which binary floating point stores as 1.00499999…, still rounds up as a person expects.
 * Compute at full precision and call this only where a bill would round: once per charge line.
 */
export function roundMoney(amount: number): number {
	const scaled = Math.abs(amount) * 100;
	const fraction = scaled - Math.floor(scaled);
	// Only values within float noise of a half cent need the slower decimal read-back.
	const nearHalf = Math.abs(fraction - 0.5) < 1e-6;
	const cents = Math.round(nearHalf ? Number(scaled.toPrecision(15)) : scaled);
	if (cents === 0) return 0;
	return amount < 0 ? -cents / 100 : cents / 100;
}

/**
 * Rounds exact shares of a sum to cents so that they add up to `total` exactly (the largest-remainder
 * method, also called Hamilton's). Rounding each share on its own leaves the shares a few cents off a
 * bill whose lines were rounded one by one; here any such gap is first spread over the shares in
 * proportion to their size, then each share is cut to whole cents and the cents left over go, one
 * each, to the shares whose cut lost the most (ties: the larger share, then the earlier one). A share
 * that is exactly zero stays zero. Example: 3.333…, 3.333…, 3.333… to 10.00 → 3.34, 3.33, 3.33.
 * When every share is zero there is nothing to spread over, and each stays zero.
 */
export function apportionMoney(exact: readonly number[], total: number): number[] {
	const totalCents = Math.round(roundMoney(total) * 100);
	const weight = exact.reduce((sum, amount) => sum + Math.abs(amount), 0);
	if (weight === 0) return exact.map(() => 0);
	const gapCents = totalCents - exact.reduce((sum, amount) => sum + amount * 100, 0);
	const quotas = exact.map((amount) => amount * 100 + (gapCents * Math.abs(amount)) / weight);
	const cents = quotas.map((quota) => Math.floor(quota));
	let left = totalCents - cents.reduce((sum, c) => sum + c, 0);
	const order = quotas
		.map((quota, i) => ({ i, lost: quota - (cents[i] ?? 0), size: Math.abs(exact[i] ?? 0) }))
		.filter((entry) => entry.size > 0)
		.sort((a, b) => b.lost - a.lost || b.size - a.size || a.i - b.i);
	// Float noise can leave `left` one past the shares that lost a part of a cent; go round again.
	for (let k = 0; left > 0 && order.length > 0; k = (k + 1) % order.length, left--) {
		const entry = order[k];
		if (entry) cents[entry.i] = (cents[entry.i] ?? 0) + 1;
	}
	return cents.map((c) => (c === 0 ? 0 : c / 100));
}
