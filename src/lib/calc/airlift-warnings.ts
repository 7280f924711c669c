import type { Warning } from './airlift';

/** Stenning & Martin's rules: submergence ratio at least 0.6; air-to-water volume ratio about 1–2. */
const MIN_SUBMERGENCE_RATIO = 0.6;
const EFFICIENT_AIR_TO_WATER = [1, 2] as const;

const figure = (n: number, digits = 1) => n.toLocaleString('en-US', { maximumFractionDigits: digits });

/** Stenning & Martin's rules of thumb and the riser's limit, in words. */
export function airliftWarnings(a: {
	waterFlowLpm: number;
	airFlowLpm: number;
	submergenceRatio: number;
	airToWaterRatio: number;
	maxWaterFlowLpm: number;
	circulating: boolean;
}): Warning[] {
	const warnings: Warning[] = [];
	if (a.submergenceRatio < MIN_SUBMERGENCE_RATIO)
		warnings.push({
			code: 'low-submergence',
			message: `Only ${figure(a.submergenceRatio * 100, 0)} % of the riser is under water (aim for 60 % or more): it will lift little water for its air. Put the air in deeper or lower the outlet.`
		});
	const [low, high] = EFFICIENT_AIR_TO_WATER;
	if (!a.circulating && a.waterFlowLpm > 0 && (a.airToWaterRatio < low / 2 || a.airToWaterRatio > high * 2))
		warnings.push({
			code: 'air-to-water',
			message: `The air is ${figure(a.airToWaterRatio)} times the water by volume; air-lifts work best between about ${low} and ${high}. ${a.airToWaterRatio > high * 2 ? 'Much of the air is wasted: a wider riser or a deeper injection would help.' : 'Check that the riser gets enough air to keep lifting.'}`
		});
	if (a.waterFlowLpm > a.maxWaterFlowLpm * 1.0001)
		warnings.push({
			code: 'beyond-riser',
			message: `This riser can carry at most about ${figure(a.maxWaterFlowLpm)} L/min of water, however much air it gets; ${figure(a.waterFlowLpm)} L/min needs a wider riser or more air-lifts.`
		});
	if (a.circulating)
		warnings.push({
			code: 'circulation-only',
			message:
				'With no lift above the water the air-lift only circulates water; its flows come from the riser model, not from an efficiency.'
		});
	return warnings;
}
