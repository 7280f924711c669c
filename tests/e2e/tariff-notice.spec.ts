import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, latestMail, lastMailId, signInWithPassword } from './helpers';

const irrigation = (
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string; name: string }[] }
).tariffs.find((t) => t.name === 'Agricultural irrigation pumping')!.id;

test('publishing a new public version e-mails the owners of affected sites the change in annual cost', async ({
	page,
	browser
}) => {
	const before = await lastMailId();
	await signInWithPassword(page, 'admin@example.org');
	await gotoReady(page, `/tariffs/${irrigation}/edit`);
	await page.getByRole('group', { name: 'Rider 1' }).getByLabel('Per kWh').fill('0.05');
	await page.getByLabel('In force from').fill('2029-01-01');
	await page
		.getByLabel('What changed (shown in the version history)')
		.fill('Rider raised (invented test change).');
	const started = Date.now();
	await page.getByRole('button', { name: /^Publish/ }).click();
	await expect(page).toHaveURL(/published=/);
	// The publish returns without waiting for the notices: the job queue sends them.
	expect(Date.now() - started).toBeLessThan(5000);

	const mail = await latestMail(
		'owner@example.org',
		/Tariff change: Agricultural irrigation pumping/,
		before
	);
	expect(mail.text).toMatch(
		/Alder Creek trout hatchery \(demo\): \$[\d,.]+ → \$[\d,.]+ a year \(\+\$[\d,.]+\)/
	);
	expect(mail.text).toContain('Rider raised (invented test change).');

	const owner = await (await browser.newContext()).newPage();
	await signInWithPassword(owner, 'owner@example.org');
	await gotoReady(owner, '/w/0d3e5c1a-6f2b-4c1e-9a57-5e1f00000001');
	await expect(owner.getByRole('region', { name: 'Notices' })).toContainText(
		'Alder Creek trout hatchery (demo)'
	);
});
