import { z } from 'zod';
import { equipmentSchema } from '$lib/calc';

/** A stored device: the core's equipment plus the safety flags; names must be unique within a scenario (the trail and charts name them). */
export const deviceSpecSchema = z.intersection(
	equipmentSchema,
	z.object({
		inWater: z.boolean().optional(),
		outdoor: z.boolean().optional(),
		notes: z.string().max(2000).optional()
	})
);

export const equipmentListSchema = z
	.object({
		expectedRevision: z.number({ error: 'Send the revision you edited (expectedRevision)' }).int().min(0),
		devices: z.array(deviceSpecSchema).max(2000, 'A scenario holds at most 2000 devices')
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
	devices: z.array(deviceSpecSchema).max(2000, 'A scenario holds at most 2000 devices')
});
