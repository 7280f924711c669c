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
