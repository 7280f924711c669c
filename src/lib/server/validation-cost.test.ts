import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
	aerationRequestSchema,
	airliftRequestSchema,
	airPumpSchema,
	calculateRequestSchema,
	compareRequestSchema,
	MAX_REPORTED_ISSUES,
	parseRequest,
	pumpingRequestSchema
} from '$lib/calc';
import { hostileBodies, probeCalculateBody } from '../../../tests/hostile-bodies';
import { billBodySchema } from './bills/bill-api';
import { deviceRowSchema, equipmentListSchema, previewSchema } from './sites/device-specs';
import { tariffSubmissionSchema } from './tariffs/submission';

/** The schema each JSON endpoint validates its body with. */
const SCHEMAS: Record<string, z.ZodType> = {
	'POST /api/v1/calculate': calculateRequestSchema,
	'POST /api/v1/compare': compareRequestSchema,
	'POST /api/v1/pumping': pumpingRequestSchema,
	'POST /api/v1/airlift': airliftRequestSchema,
	'POST /api/v1/aeration': aerationRequestSchema,
	'POST /api/v1/workspaces/:id/air-pumps': airPumpSchema,
	'PUT /api/v1/scenarios/:id/equipment': equipmentListSchema,
	'POST /api/v1/scenarios/:id/results': previewSchema,
	'PUT /api/v1/scenarios/:id/equipment/:position': deviceRowSchema,
	// As PATCH /api/v1/scenarios/:id: a strict object, which names every unknown key in one issue.
	'PATCH /api/v1/scenarios/:id': z.strictObject({ name: z.string().optional() }),
	'POST /api/v1/tariffs': tariffSubmissionSchema,
	'POST /api/v1/sites/:id/bills': billBodySchema
};

const schemaOf = (name: string) => SCHEMAS[name.replace(/ \(.*\)$/, '')]!;

/**
 * CPU milliseconds (all threads of this process) to validate one body and write the answer. Reading
 * the JSON text (JSON.parse, done once by readJsonBody before validation) is left out: its cost is the
 * platform's and linear in the bytes.
 */
function answerCpuMs(schema: z.ZodType, text: string) {
	const json: unknown = JSON.parse(text);
	const before = process.cpuUsage();
	const parsed = parseRequest(schema, json);
	const answer = JSON.stringify(parsed.success ? {} : parsed.error);
	const used = process.cpuUsage(before);
	return { ms: (used.user + used.system) / 1000, answer, parsed };
}

// Validation runs on the event loop: a body under the 1 MB limit that took seconds to refuse would
// stall every other request meanwhile (issue 14, item 1: 7.7 s and a 3.7 MB answer before the fix).
describe('refusing the costliest bodies under the 1 MB limit', () => {
	const bodies = Object.entries(hostileBodies());
	it.each(bodies)('%s: answers in under 200 ms of CPU with a capped list', (name, { body, bytes }) => {
		expect(bytes).toBeLessThan(1024 * 1024);
		const schema = schemaOf(name);
		const text = JSON.stringify(body);
		answerCpuMs(schema, '{}'); // compile the schema's fast paths once, as a running server has
		const runs = [1, 2, 3].map(() => answerCpuMs(schema, text));
		const median = runs.map((r) => r.ms).sort((a, b) => a - b)[1]!;
		const { parsed, answer } = runs[0]!;
		expect(parsed.success).toBe(false);
		if (parsed.success) return;
		console.log(
			`${name}: ${(bytes / 1024).toFixed(0)} kB, ${parsed.error.issues.length} issues, answer ${answer.length} bytes, ${median.toFixed(0)} ms CPU`
		);
		expect(parsed.error.issues.length).toBeLessThanOrEqual(MAX_REPORTED_ISSUES + 1);
		expect(answer.length).toBeLessThan(20_000);
		expect(median).toBeLessThan(200);
	});
});

describe('the answer to a body with many problems', () => {
	const parsed = parseRequest(calculateRequestSchema, probeCalculateBody());

	it('lists the first problems, each once, and says in words how many more were left out', () => {
		expect(parsed.success).toBe(false);
		if (parsed.success) return;
		const { issues } = parsed.error;
		expect(issues).toHaveLength(MAX_REPORTED_ISSUES + 1);
		expect(issues[0]).toEqual({
			path: 'equipment.0.schedule.windows.0.start',
			message: 'Start must be on a quarter hour (:00, :15, :30 or :45)'
		});
		expect(new Set(issues.map((i) => `${i.path} ${i.message}`)).size).toBe(issues.length);
		expect(issues.at(-1)).toEqual({
			path: '',
			message: expect.stringMatching(/^\d+ more problems were left out; fix these and send again/)
		});
	});

	it('says where a list stopped checking its entries', () => {
		const result = calculateRequestSchema.safeParse(probeCalculateBody());
		const messages = result.error?.issues.map((issue) => issue.message) ?? [];
		// 2000 devices × 16 problems; the equipment list stops after the device that makes 100 or more.
		expect(messages).toHaveLength(113);
		expect(messages.at(-1)).toBe(
			'Equipment: entries after number 7 were not checked, as the ones before already have 112 problems'
		);
	});
});
