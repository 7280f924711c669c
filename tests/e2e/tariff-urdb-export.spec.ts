import { expect, test } from '@playwright/test';
import { publicTariff } from './access-routes';

// GET /api/v1/tariffs/:id/urdb.json: a public tariff in the open rate database's shape, as a download.
test('a public tariff downloads in the open rate database’s shape, with what was not written beside it', async ({
	request
}) => {
	const response = await request.get(`/api/v1/tariffs/${publicTariff}/urdb.json`);
	expect(response.status()).toBe(200);
	expect(response.headers()['content-disposition']).toMatch(/^attachment; filename=".+-urdb\.json"$/);
	const body = (await response.json()) as { items: Record<string, unknown>[]; notWritten: unknown[] };
	expect(body.items).toHaveLength(1);
	expect(body.items[0]).toEqual(
		expect.objectContaining({ utility: expect.any(String), name: expect.any(String) })
	);
	expect(Array.isArray(body.notWritten)).toBe(true);

	const word = await request.get(`/api/v1/tariffs/${publicTariff}/urdb.json?version=first`);
	expect(word.status()).toBe(400);
	expect(JSON.stringify(await word.json())).toContain('Version must be a whole number from 1');
	const missing = await request.get(`/api/v1/tariffs/${publicTariff}/urdb.json?version=999`);
	expect(missing.status()).toBe(404);
});
