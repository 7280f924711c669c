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
export function apportionMoney(exact: ArrayLike<number>, total: number): number[] {
	// Plain loops over indices: this runs once per billing period over every device (1,200 shares for
	// 100 devices over a year), and the per-share objects and closures it used to make were a
	// measurable share of a calculation request's garbage. Sums run in the same order as before.
	const n = exact.length;
	const totalCents = Math.round(roundMoney(total) * 100);
	let weight = 0;
	let exactCents = 0;
	for (let i = 0; i < n; i++) {
		const amount = exact[i]!;
		weight += Math.abs(amount);
		exactCents += amount * 100;
	}
	const cents: number[] = [];
	if (weight === 0) {
		for (let i = 0; i < n; i++) cents.push(0);
		return cents;
	}
	const gapCents = totalCents - exactCents;
	const lost = new Float64Array(n);
	const order: number[] = [];
	let left = totalCents;
	for (let i = 0; i < n; i++) {
		const amount = exact[i]!;
		const quota = amount * 100 + (gapCents * Math.abs(amount)) / weight;
		const cut = Math.floor(quota);
		cents.push(cut);
		lost[i] = quota - cut;
		left -= cut; // whole numbers: the same as subtracting their sum
		if (Math.abs(amount) > 0) order.push(i);
	}
	order.sort((a, b) => lost[b]! - lost[a]! || Math.abs(exact[b]!) - Math.abs(exact[a]!) || a - b);
	// Float noise can leave `left` one past the shares that lost a part of a cent; go round again.
	for (let k = 0; left > 0 && order.length > 0; k = (k + 1) % order.length, left--) cents[order[k]!]! += 1;
	for (let i = 0; i < n; i++) cents[i] = cents[i] === 0 ? 0 : cents[i]! / 100;
	return cents;
}
