import { describe, expect, it } from 'vitest';
import { TYPICAL_AIR_PUMPS, type AirDesign } from '$lib/calc';
import { blankConditions, checkConditions } from './conditions';
import { blankDraft, checkDesign } from './design-draft';
import { fewestWatts, runDesign } from './run-design';
import { initialPump, pumpOptions } from './pump-options';

const options = pumpOptions(TYPICAL_AIR_PUMPS, [], null);

describe('the designer runs the core as the person types', () => {
	it('works the blank design (issue 18’s worked example) out to about 29.5 L/min at about 6.9 kPa', () => {
		// Issue 18: 20 L/min lifted 0.3 m, injection 0.7 m deep, fresh water at 20 °C, η 30 % → about
		// 29.5 L/min of free air at about 6.9 kPa gauge (derived from Nicklin's definition).
		const draft = blankDraft(initialPump(options, null, fewestWatts(undefined)));
		draft.lineLossKPa = 0;
		const pump = options.find((o) => o.value === draft.pump)!;
		const { design } = checkDesign(draft, pump);
		const { conditions } = checkConditions(blankConditions());
		const outcome = runDesign(design!, conditions!);
		expect(outcome.result?.totalAirLpm).toBeCloseTo(29.5, 0);
		expect(outcome.result?.pressureKPa).toBeCloseTo(6.9, 1);
	});

	it('opens on a typical pump that can run the blank design', () => {
		const value = initialPump(options, null, fewestWatts(undefined));
		const chosen = options.find((o) => o.value === value)!;
		expect(fewestWatts(undefined)(chosen.pump)).not.toBeNull();
	});

	it('answers a sentence, never NaN, when the core cannot work a design out', () => {
		const broken = { airlifts: [{}], aeration: null, lineLossKPa: 0, pump: TYPICAL_AIR_PUMPS[0]!.pump };
		const outcome = runDesign(broken as unknown as AirDesign, checkConditions(blankConditions()).conditions!);
		expect(outcome.result).toBeNull();
		expect(outcome.problem).toMatch(/cannot be worked out/);
	});
});
