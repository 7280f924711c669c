import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import { type TariffInput, tariffSchema } from '$lib/calc';
import TariffEditor from './TariffEditor.svelte';
import { postedStructure } from './posted.fixture';
import { describeField, tariffIssues } from './tariff-editor';

// An invented tariff (no real utility's rates): an off-peak demand charge measured on weekday nights
// and all day at weekends, as an open-rate-database import writes it.
const stored = (): TariffInput => ({
	currency: 'USD',
	holidaysAsWeekends: true,
	fixedCharges: [],
	energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1 }],
	demandCharges: [
		{
			label: 'Off-peak demand',
			perKw: 3,
			intervalMinutes: 60,
			days: 'all',
			windows: [{ start: '20:00', end: '15:00' }],
			weekendWindows: [{ start: '00:00', end: '24:00' }]
		}
	],
	riders: [],
	taxes: []
});

describe('the tariff editor on a demand charge with other hours at weekends', () => {
	it('loads it valid and posts the weekend hours as they are', () => {
		expect(tariffIssues(stored())).toEqual([]);
		expect(
			tariffSchema.parse(postedStructure(stored(), 'Weekend demand')).demandCharges[0]?.weekendWindows
		).toEqual([{ start: '00:00', end: '24:00' }]);
	});

	it('shows the weekday and weekend hours, each in its own list', () => {
		const body = render(TariffEditor, { props: { value: stored() } }).body;
		for (const words of [
			'Other hours at weekends',
			'Hours it applies on weekdays',
			'Hours it applies at weekends',
			'id="te-demandCharges-0-weekendWindows-0-start"'
		])
			expect(body).toContain(words);
	});

	it('offers weekend hours only on a charge of every day with hours', () => {
		const weekdays = stored();
		const charge = weekdays.demandCharges![0]!;
		charge.days = 'weekdays';
		delete charge.weekendWindows;
		expect(render(TariffEditor, { props: { value: weekdays } }).body).not.toContain(
			'Other hours at weekends'
		);
	});

	it('gives the message at the weekend hours, named in words', () => {
		const broken = stored();
		broken.demandCharges![0]!.days = 'weekdays';
		expect(tariffIssues(broken)).toEqual([
			{
				path: 'demandCharges.0.weekendWindows',
				message: 'Other hours at weekends need a charge measured every day'
			}
		]);
		expect(describeField('demandCharges.0.weekendWindows')).toBe('Demand charge 1 · Other hours at weekends');
		expect(describeField('demandCharges.0.weekendWindows.0.start')).toBe(
			'Demand charge 1 · weekend window 1 · Start'
		);
		// The list stays on the page while it holds hours, so the message has a place to show.
		expect(render(TariffEditor, { props: { value: broken } }).body).toContain(
			'id="te-demandCharges-0-weekendWindows"'
		);
	});
});
