/**
 * Invented requests for the core's tests: "Demo Valley Power" and its rates are fictional. Builders
 * take the JSON input shape and return what the schema parses it to, so tests exercise the defaults.
 */
import { calculate } from './calculate';
import type { EquipmentInput } from './equipment.schema';
import { type RequestIssue, parseRequest } from './parse';
import { type CalculateRequest, type CalculateRequestInput, calculateRequestSchema } from './request.schema';
import type { TariffInput } from './tariff.schema';
import type { CalculateResponse, ChargeKind, PeriodResult } from './types';

export type ScheduleInput = EquipmentInput['schedule'];

export function flatTariff(perKwh: number, more: Partial<TariffInput> = {}): TariffInput {
	return { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh }], ...more };
}

export function device(more: Partial<EquipmentInput> = {}): EquipmentInput {
	return { name: 'Demo pump', power: { watts: 1000 }, schedule: { type: 'always' }, ...more };
}

export function request(more: Partial<CalculateRequestInput> = {}): CalculateRequest {
	const input: CalculateRequestInput = {
		period: { start: '2027-06', months: 1 },
		timezone: 'UTC',
		holidays: null,
		tariff: flatTariff(0.1),
		equipment: [device()],
		...more
	};
	const parsed = calculateRequestSchema.safeParse(input);
	if (!parsed.success) throw new Error(JSON.stringify(parsed.error.issues));
	return parsed.data;
}

export function run(more: Partial<CalculateRequestInput> = {}): CalculateResponse {
	return calculate(request(more));
}

/** The single period of a one-period calculation. */
export function onlyPeriod(more: Partial<CalculateRequestInput> = {}): PeriodResult {
	const [period] = run(more).periods;
	if (!period) throw new Error('No period');
	return period;
}

/** The amount of the line with this kind (and label, when given). */
export function line(period: PeriodResult, kind: ChargeKind, label?: string): number {
	const found = period.charges.find(
		(charge) => charge.kind === kind && (label === undefined || charge.label === label)
	);
	if (!found) throw new Error(`No ${kind} line ${label ?? ''}`);
	return found.amount;
}

export function sumOfLines(period: PeriodResult): number {
	return period.charges.reduce((sum, charge) => sum + charge.amount, 0);
}

/** A valid calculate request in its JSON form, for validation tests to break one field at a time. */
export const VALID_INPUT: CalculateRequestInput = {
	period: { start: '2027-01', months: 12 },
	timezone: 'America/Chicago',
	holidays: { country: 'US', region: 'TX' },
	tariff: { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.12 }] },
	equipment: [{ name: 'Demo pump', power: { amps: 1, volts: 120 }, schedule: { type: 'always' } }]
};

type LooseInput = Record<string, unknown> & { equipment: Array<Record<string, unknown>> };
export type Edit = (input: LooseInput) => void;

/** The issues parseRequest reports for the valid request after an edit. */
export function issuesAfter(edit: Edit): RequestIssue[] {
	const input = structuredClone(VALID_INPUT) as LooseInput;
	edit(input);
	const result = parseRequest(calculateRequestSchema, input);
	return result.success ? [] : result.error.issues;
}

export const setField =
	(key: string, value: unknown): Edit =>
	(input) => {
		input[key] = value;
	};

export const setDevice =
	(more: Record<string, unknown>): Edit =>
	(input) => {
		input.equipment[0] = { ...input.equipment[0], ...more };
	};
