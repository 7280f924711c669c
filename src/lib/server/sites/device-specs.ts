import { z } from 'zod';
import { amount, equipmentSchema, list } from '$lib/calc';
import { MAX_REVISION, storableText, UNSTORABLE } from '$lib/forms/storable';

/** A stored device: the core's equipment plus the safety flags; names must be unique within a scenario (the trail and charts name them). */
export const deviceSpecSchema = z.intersection(
	equipmentSchema,
	z.object({
		inWater: z.boolean().optional(),
		outdoor: z.boolean().optional(),
		notes: z.string().max(2000).refine(storableText, UNSTORABLE).optional(),
		waterLpm: amount('Water moved', { min: 0, max: 10_000_000 }).optional(),
		airLpm: amount('Air delivered', { min: 0, max: 10_000_000 }).optional(),
		fromAirDesign: z.boolean().optional()
	})
);

/** Up to 2000 devices, checked entry by entry until enough problems are found to report. */
const devicesSchema = list('Devices', deviceSpecSchema, {
	max: 2000,
	tooMany: 'A scenario holds at most 2000 devices'
});

const expectedRevision = z
	.number({ error: 'Send the revision you edited (expectedRevision)' })
	.int()
	.min(0)
	.max(MAX_REVISION);

export const equipmentListSchema = z
	.object({
		expectedRevision,
		devices: devicesSchema
	})
	.superRefine((body, ctx) => {
		const seen = new Map<string, number>();
		body.devices.forEach((d, i) => {
			const key = d.name.trim().toLowerCase();
			if (seen.has(key))
				ctx.addIssue({
					code: 'custom',
					path: ['devices', i, 'name'],
					message: `Another device (row ${seen.get(key)! + 1}) has this name`
				});
			else seen.set(key, i);
		});
	});

export const previewSchema = z.object({
	devices: devicesSchema
});

/** One row of the list through the API: `{ expectedRevision, device }`; a new row may say where it goes (0 = first). */
export const deviceRowSchema = z.object({ expectedRevision, device: deviceSpecSchema });

export const newDeviceRowSchema = deviceRowSchema.extend({
	position: z.number({ error: 'Position must be a whole number' }).int().min(0).optional()
});
