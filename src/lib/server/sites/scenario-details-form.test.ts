import { describe, expect, it } from 'vitest';
import { readDetailsForm } from './scenario-details-form';

const form = (fields: Record<string, string>) => {
	const data = new FormData();
	for (const [name, value] of Object.entries(fields)) data.append(name, value);
	return data;
};
const base = {
	revision: '4',
	name: 'Small pump plus an air-lift',
	description: '',
	status: 'proposed',
	tariffId: ''
};
const stored = { tariffId: null, tariffVersion: null };

describe('the scenario page’s details form', () => {
	it('reads one-off costs by row, money as people type it, and drops a row left blank', () => {
		const read = readDetailsForm(
			form({
				...base,
				'oneOffCosts.0.label': 'Trench and outdoor circuit',
				'oneOffCosts.0.amount': '$2,500',
				'oneOffCosts.0.note': '',
				'oneOffCosts.1.label': '',
				'oneOffCosts.1.amount': ' ',
				'oneOffCosts.1.note': ''
			}),
			stored
		);
		expect(read).toMatchObject({
			ok: true,
			revision: 4,
			details: {
				name: 'Small pump plus an air-lift',
				description: null,
				status: 'proposed',
				tariff: null,
				oneOffCosts: [{ label: 'Trench and outdoor circuit', amount: 2500 }]
			}
		});
	});

	it('ties each message to its field and keeps what was typed', () => {
		const read = readDetailsForm(
			form({
				...base,
				name: ' ',
				status: 'bought',
				'oneOffCosts.0.label': 'Piping',
				'oneOffCosts.0.amount': '12a'
			}),
			stored
		);
		expect(read).toEqual({
			ok: false,
			errors: {
				name: 'Name the scenario',
				status: 'Choose whether this is what is installed or a proposal',
				'oneOffCosts.0.amount': 'Amount must be a number'
			},
			values: {
				name: ' ',
				description: '',
				status: 'bought',
				tariffId: '',
				oneOffCosts: [{ label: 'Piping', amount: '12a', note: '' }]
			}
		});
	});

	it('keeps the pinned version of the tariff the scenario already has', () => {
		const id = '5c0e0000-0000-4000-8000-000000000999';
		const read = readDetailsForm(form({ ...base, tariffId: id }), { tariffId: id, tariffVersion: 2 });
		expect(read.ok && read.details.tariff).toEqual({ tariffId: id, tariffVersion: 2 });
	});
});
