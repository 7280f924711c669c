import { z } from 'zod';
import { equipmentSchema } from './equipment.schema';
import { amount, choice, list, record, text } from './fields';
import { holidaysSchema, periodSchema, timezoneSchema } from './period.schema';
import { tariffSchema } from './tariff.schema';
import { meterCoverageIssues } from './meter';
import { meterSchema } from './meter.schema';
import { billingSpans } from './periods';

const calculationFields = {
	period: periodSchema,
	timezone: timezoneSchema,
	holidays: holidaysSchema,
	tariff: tariffSchema
};

/** The body of POST /api/v1/calculate: equipment, a meter's measured use, or both. */
export const calculateRequestSchema = record('Request', {
	...calculationFields,
	equipment: list('Equipment', equipmentSchema, { max: 2000 }).default([]),
	meter: meterSchema.optional()
}).superRefine((request, ctx) => {
	if (!request.meter) return;
	// The library variant lets the time zone default to the tariff's; a meter's local times need it said.
	if (!request.timezone) {
		ctx.addIssue({ code: 'custom', path: ['timezone'], message: 'Give the time zone of the meter data' });
		return;
	}
	for (const message of meterCoverageIssues(request.meter, request.timezone, billingSpans(request.period))) {
		ctx.addIssue({ code: 'custom', path: ['meter', 'kwh'], message });
	}
});

/** What a scenario's equipment is: already installed and paid for, or proposed and bought now. */
export const SCENARIO_STATUSES = ['installed', 'proposed'] as const;
export type ScenarioStatus = (typeof SCENARIO_STATUSES)[number];

/** A cost paid once when a scenario is carried out: a trench, an outdoor circuit, an electrician's visit. */
export const oneOffCostSchema = record('One-off cost', {
	label: text('Label', 80),
	amount: amount('Amount', { min: -1_000_000_000, max: 1_000_000_000 }),
	note: text('Note', 500).optional()
});
export type OneOffCost = z.output<typeof oneOffCostSchema>;

const scenarioSchema = record('Scenario', {
	name: text('Name', 120),
	status: choice('Status', SCENARIO_STATUSES).default('proposed'),
	equipment: list('Equipment', equipmentSchema, { max: 2000 }),
	oneOffCosts: list('One-off costs', oneOffCostSchema, { max: 50 }).default([]),
	tariff: tariffSchema.optional()
});

/** The body of POST /api/v1/compare: the calculation fields, scenarios and the finance assumptions. */
export const compareRequestSchema = record('Request', {
	...calculationFields,
	scenarios: list('Scenarios', scenarioSchema, { min: 1, max: 20 }),
	baseline: amount('Baseline', { integer: true, min: 0, max: 19 }).default(0),
	finance: record('Finance', {
		horizonYears: amount('Horizon years', { integer: true, min: 1, max: 50 }),
		discountPercent: amount('Discount percent', { min: 0, max: 100 }),
		escalationPercent: amount('Escalation percent', { min: -50, max: 100 })
	}),
	emissionFactorKgPerKwh: amount('Emission factor', { min: 0, max: 5 }).default(0)
}).superRefine((request, ctx) => {
	if (!('months' in request.period) || request.period.months !== 12) {
		ctx.addIssue({ code: 'custom', path: ['period'], message: 'A comparison covers 12 calendar months' });
	}
	if (request.baseline >= request.scenarios.length) {
		ctx.addIssue({
			code: 'custom',
			path: ['baseline'],
			message: 'Baseline must be the index of one of the scenarios'
		});
	}
	const devices = request.scenarios.reduce((sum, scenario) => sum + scenario.equipment.length, 0);
	if (devices > 10_000) {
		ctx.addIssue({
			code: 'custom',
			path: ['scenarios'],
			message: 'A comparison can hold at most 10,000 devices'
		});
	}
});

export type CalculateRequest = z.output<typeof calculateRequestSchema>;
export type CalculateRequestInput = z.input<typeof calculateRequestSchema>;
export type CompareRequest = z.output<typeof compareRequestSchema>;
export type CompareRequestInput = z.input<typeof compareRequestSchema>;
export type Scenario = CompareRequest['scenarios'][number];
