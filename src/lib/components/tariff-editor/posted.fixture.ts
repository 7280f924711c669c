/** Test support: the structure a tariff editor posts, through the form's submission and JSON, as the server reads it. */
import type { TariffInput } from '$lib/calc';
import { metaDraftFrom, submission } from '$lib/components/tariff-form/tariff-form';

export const postedStructure = (structure: TariffInput, name = 'Real charges') =>
	JSON.parse(
		JSON.stringify(
			submission(
				metaDraftFrom({ utility: 'Demo Valley Power (invented)', name, timezone: 'UTC' }),
				{
					effectiveFrom: '2027-01-01',
					effectiveTo: '',
					source: 'Invented for this test',
					checkedOn: '2026-12-03',
					changeNote: ''
				},
				structure
			)
		)
	).structure as TariffInput;
