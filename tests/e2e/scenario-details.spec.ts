import { expect, test } from '@playwright/test';
import { gotoReady, rawPump, signInWithPassword } from './helpers';
import { PUBLIC_TARIFF, baselineOf, callerOn, createSite, demoSites } from './site-setup';

// Issue 17, points 1, 2, 3 and 5: a scenario's own details on its page. The site is invented and made
// through the API, so the demo sites stay as other tests see them.
const hatchery = demoSites.sites[0]!;

test.describe('a scenario’s details on its page', () => {
	test('an editor makes a proposal, enters a one-off cost and a new name, and the comparison counts it', async ({
		page,
		baseURL
	}) => {
		const editor = await callerOn(page, 'editor@example.org', baseURL!);
		const siteId = await createSite(editor, 'Details test site', { tariffId: PUBLIC_TARIFF });
		const baseline = await baselineOf(editor.request, siteId);
		const created = await editor.request.post(`/api/v1/sites/${siteId}/scenarios`, {
			headers: editor.headers,
			data: { name: 'Smaller pump', fromScenarioId: baseline }
		});
		expect(created.status()).toBe(201);
		const proposal = (await created.json()).id as string;
		// The proposal buys one pump at $800 (an invented price).
		const put = await editor.request.put(`/api/v1/scenarios/${proposal}/equipment`, {
			headers: editor.headers,
			data: { expectedRevision: 1, devices: [{ ...rawPump, power: { watts: 90 }, purchaseCost: 800 }] }
		});
		expect(put.status()).toBe(200);

		await gotoReady(page, `/sites/${siteId}/scenarios/${proposal}`);
		await expect(page.getByTestId('scenario-status')).toContainText(
			'A proposal (bought now): its equipment and one-off costs are its capital'
		);
		await page.getByText('Change the name, kind, tariff or one-off costs').click();
		await page.getByLabel('Scenario name').fill('Small pump plus an air-lift (invented)');
		await page.getByRole('button', { name: 'Add a one-off cost' }).click();
		await page.getByLabel('What it is').fill('Trench and outdoor circuit');
		await page.getByLabel('Amount (USD)').fill('lots');
		await page.getByRole('button', { name: 'Save the details' }).click();

		// The bad amount is refused beside its field, once, in words; nothing typed is lost.
		const amount = page.getByLabel('Amount (USD)');
		await expect(amount).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('Amount must be a number')).toHaveCount(1);
		await expect(page.getByLabel('What it is')).toHaveValue('Trench and outdoor circuit');

		await amount.fill('2,500');
		await page.getByRole('button', { name: 'Save the details' }).click();
		await expect(page.getByText('Details saved.')).toBeVisible();
		await expect(page.getByRole('heading', { level: 1 })).toHaveText(
			'Small pump plus an air-lift (invented)'
		);
		await expect(page.getByRole('table', { name: 'One-off costs of this scenario' })).toContainText(
			'$2,500.00'
		);

		// The API reads what the page saved, and the comparison counts it as capital in year 0.
		const read = await (await editor.request.get(`/api/v1/scenarios/${proposal}`)).json();
		expect(read).toMatchObject({
			status: 'proposed',
			oneOffCosts: [{ label: 'Trench and outdoor circuit', amount: 2500 }]
		});
		const compared = await editor.request.get(
			`/api/v1/compare?scenarios=${baseline},${proposal}&baseline=${baseline}&start=2027-01`
		);
		expect(compared.status()).toBe(200);
		const report = (await compared.json()) as {
			result: { scenarios: { capitalCost: number; status: string }[] };
		};
		expect(report.result.scenarios.map((s) => [s.status, s.capitalCost])).toEqual([
			['installed', 0],
			['proposed', 800 + 2500]
		]);

		// At the tank, on a phone: nothing scrolls sideways and each control is at least 44 px tall.
		await page.setViewportSize({ width: 390, height: 844 });
		await page.getByText('Change the name, kind, tariff or one-off costs').click();
		for (const control of [
			page.getByText('Change the name, kind, tariff or one-off costs'),
			page.getByRole('button', { name: 'Remove one-off cost 1' }),
			page.getByRole('button', { name: 'Add a one-off cost' }),
			page.getByRole('radio', { name: /What is installed/ }).locator('xpath=ancestor::label'),
			page.getByRole('button', { name: 'Save the details' })
		]) {
			const box = await control.boundingBox();
			expect(box?.height ?? 0).toBeGreaterThanOrEqual(44);
		}
		expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

		// The trail says what changed, in words.
		await gotoReady(page, `/sites/${siteId}`);
		await expect(page.getByRole('list', { name: 'Changes to this site' })).toContainText(
			'one-off costs none → Trench and outdoor circuit $2,500.00'
		);
	});

	test('a viewer reads the details but cannot change them', async ({ page }) => {
		const scenario = hatchery.scenarios.find((s) => s.name === 'Small pump plus an air-lift')!;
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, `/sites/${hatchery.id}/scenarios/${scenario.id}`);
		await expect(page.getByTestId('scenario-status')).toContainText(
			'A proposal (bought now): its equipment and one-off costs are its capital'
		);
		await expect(page.getByRole('table', { name: 'One-off costs of this scenario' })).toContainText('$95.00');
		await expect(page.getByText('Change the name, kind, tariff or one-off costs')).toHaveCount(0);
		await expect(page.getByRole('button', { name: 'Save the details' })).toHaveCount(0);
	});
});
