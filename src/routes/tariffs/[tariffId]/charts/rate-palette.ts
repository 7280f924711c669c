import { scaleLinear } from 'd3-scale';

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
	const scale = scaleLinear<string>()
		.domain(RATE_RAMP.map((_, i) => low + step * i))
		.range([...RATE_RAMP])
		.clamp(true);
	return (perKwh) => scale(perKwh);
}
