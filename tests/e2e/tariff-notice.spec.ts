import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_WS, gotoReady, latestMail, lastMailId, signInWithPassword } from './helpers';

const irrigation = (
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string; name: string }[] }
).tariffs.find((t) => t.name === 'Agricultural irrigation pumping')!.id;

test('publishing a new public version e-mails the owners and editors of affected sites the change in annual cost', async ({
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
	// The curator is told who hears of it.
	await expect(page.getByRole('status').filter({ hasText: 'is published' })).toContainText(
		/\d+ (person|people) in \d+ workspaces? (was|were) told by e-mail/
	);

	// Owners and editors can act on it, so both are e-mailed; the curator, not the utility, published it.
	for (const to of ['owner@example.org', 'editor@example.org']) {
		const mail = await latestMail(to, /Tariff change: Agricultural irrigation pumping/, before);
		expect(mail.text).toMatch(
			/Alder Creek trout hatchery \(demo\): \$[\d,.]+ → \$[\d,.]+ a year \(\+\$[\d,.]+\)/
		);
		expect(mail.text).toMatch(
			/^The library's curator published version \d+ of Agricultural irrigation pumping/
		);
		expect(mail.text).toContain('Rider raised (invented test change).');
		expect(mail.text).toContain(`/tariffs/${irrigation}`);
		expect(mail.text).toMatch(/Alder Creek trout hatchery \(demo\): http\S+\/sites\/[0-9a-f-]{36}/);
	}

	const owner = await (await browser.newContext()).newPage();
	await signInWithPassword(owner, 'owner@example.org');
	await gotoReady(owner, `/w/${DEMO_WS.id}`);
	const notices = owner.getByRole('region', { name: 'Notices' });
	await expect(notices).toContainText('Alder Creek trout hatchery (demo)');
	await expect(notices).not.toContainText('Demo Valley Power Cooperative (invented) published');

	// The sites dashboard shows it too, with links to the tariff and to the site.
	await gotoReady(owner, `/w/${DEMO_WS.id}/sites`);
	const onDashboard = owner.getByRole('region', { name: 'Notices' });
	await expect(onDashboard).toContainText("The library's curator published version");
	await onDashboard.getByRole('link', { name: 'Alder Creek trout hatchery (demo)' }).first().click();
	await expect(owner).toHaveURL(/\/sites\/[0-9a-f-]{36}$/);
	await gotoReady(owner, `/w/${DEMO_WS.id}/sites`);
	await owner
		.getByRole('region', { name: 'Notices' })
		.getByRole('link', { name: /The tariff: Agricultural irrigation pumping/ })
		.first()
		.click();
	await expect(owner).toHaveURL(new RegExp(`/tariffs/${irrigation}$`));
});
