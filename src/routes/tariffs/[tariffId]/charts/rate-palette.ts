/**
 * Runrate's sequential ramp for prices: a pale reed green for the cheapest rate, through a soft
 * straw, to a deep sun amber for the dearest. Lightness falls steadily along it, so the order still
 * reads in grey (printed, or in bright sun on a phone).
 */
export const RATE_RAMP = ['#d6e8da', '#b3d3b9', '#d3c67c', '#c58a2c', '#7c4a0f'] as const;

/** The colour of a rate between the cheapest and the dearest shown; one rate alone takes the middle. */
export function rateColour([low, high]: readonly [number, number]): (perKwh: number) => string {
	if (!(high > low)) return () => RATE_RAMP[2];
	const step = (high - low) / (RATE_RAMP.length - 1);
	const last = RATE_RAMP.length - 1;
	// Straight lines between the ramp's colours, channel by channel, clamped at both ends: what d3's linear
	// scale with these colours as its range gave, without d3 in the page's first download.
	return (perKwh) => {
		const at = Math.min(Math.max((perKwh - low) / step, 0), last);
		const i = Math.min(Math.floor(at), last - 1);
		const from = channels(RATE_RAMP[i]!);
		const to = channels(RATE_RAMP[i + 1]!);
		const mixed = from.map((c, k) => Math.round(c + (to[k]! - c) * (at - i)));
		return `rgb(${mixed.join(', ')})`;
	};
}

/** "#d6e8da" as its red, green and blue channels. */
const channels = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
