import { describe, expect, it } from 'vitest';
import { TYPICAL_AIR_PUMPS } from '$lib/calc';
import { blankDraft, checkDesign, designInput, draftOf, nextAirlift } from './design-draft';
import { initialPump, pumpOptions } from './pump-options';

const options = pumpOptions(TYPICAL_AIR_PUMPS, [], null);
const typical = () => options.find((o) => o.value === initialPump(options, null))!;

describe('a blank designer', () => {
	it('holds a design the core accepts: one air-lift, no aeration, 2 kPa of line loss', () => {
		const checked = checkDesign(blankDraft(typical().value), typical());
		expect(checked.issues).toEqual([]);
		expect(checked.design?.airlifts).toHaveLength(1);
		expect(checked.design?.aeration).toBeNull();
		expect(checked.design?.lineLossKPa).toBe(2);
		expect(checked.design?.pumpSource).toEqual(typical().source);
	});

	it('starts from the worked example of issue 18 (derived from the equation: 20 L/min, 0.3 m, 0.7 m, 25 mm, 30 %)', () => {
		const [row] = blankDraft('').airlifts;
		expect(row).toMatchObject({
			waterFlow: 20,
			waterFlowUnit: 'lpm',
			lift: 0.3,
			submergence: 0.7,
			riserInnerDiameter: 25,
			riserInnerDiameterUnit: 'mm',
			efficiencyPercent: 30
		});
	});
});

describe('problems, named at their box', () => {
	it('says a box holding text that is not a number must be one, at that box only', () => {
		const draft = blankDraft(typical().value);
		draft.airlifts[0]!.lift = '0.3m';
		const { issues } = checkDesign(draft, typical());
		expect(issues).toEqual([{ path: 'airlifts.0.lift', message: 'Lift must be a number' }]);
	});

	it('says an empty box is required, and fills a box with a default from the schema', () => {
		const draft = blankDraft(typical().value);
		draft.airlifts[0]!.submergence = undefined;
		draft.airlifts[0]!.efficiencyPercent = undefined;
		expect(checkDesign(draft, typical()).issues).toEqual([
			{ path: 'airlifts.0.submergence', message: 'Submergence is required' }
		]);
		draft.airlifts[0]!.submergence = 0.7;
		expect(checkDesign(draft, typical()).design?.airlifts[0]?.efficiencyPercent).toBe(30);
	});

	it('asks for an air-lift or aeration when the design has neither', () => {
		const draft = blankDraft(typical().value);
		draft.airlifts = [];
		expect(checkDesign(draft, typical()).issues).toEqual([
			{ path: 'airlifts', message: 'Add an air-lift or aeration to design' }
		]);
		draft.aerationOn = true;
		expect(checkDesign(draft, typical()).issues).toEqual([]);
	});

	it('asks for a pump when none is chosen', () => {
		expect(checkDesign(blankDraft(''), null).issues).toEqual([
			{ path: 'pump', message: 'Choose an air pump' }
		]);
	});

	it('keeps what was typed for aeration while it is switched off, and sends none', () => {
		const draft = blankDraft(typical().value);
		draft.aeration.targetDoMgL = 'lots';
		expect(checkDesign(draft, typical()).issues).toEqual([]);
		expect(designInput(draft, typical()).aeration).toBeNull();
		draft.aerationOn = true;
		expect(checkDesign(draft, typical()).issues).toEqual([
			{ path: 'aeration.targetDoMgL', message: 'Target dissolved oxygen must be a number' }
		]);
	});
});

describe('a saved design', () => {
	it('opens as it was saved and checks to the same design', () => {
		const draft = blankDraft(typical().value);
		draft.airlifts.push(nextAirlift(draft.airlifts));
		draft.aerationOn = true;
		draft.aeration.transferPercentPerM = 6;
		const saved = checkDesign(draft, typical()).design!;
		const reopened = checkDesign(draftOf(saved, typical().value), typical()).design;
		expect(reopened).toEqual(saved);
		expect(reopened?.airlifts.map((a) => a.name)).toEqual(['Air-lift', 'Air-lift 2']);
		expect(reopened?.aeration?.transferPercentPerM).toBe(6);
	});

	it('gives each row its own key, so a removed row takes its boxes with it', () => {
		const draft = blankDraft('');
		const next = nextAirlift(draft.airlifts);
		expect(next.key).not.toBe(draft.airlifts[0]!.key);
	});
});
