import { expect, test } from '@playwright/test';
import { DEMO_WS, gotoReady, latestMail, linkIn, OTHER_WS, signInWithPassword, uniqueEmail } from './helpers';

test.describe('workspace members', () => {
	test('an owner invites a new person by e-mail, who creates an account from the link and joins as viewer', async ({
		page,
		browser
	}) => {
		const email = uniqueEmail('invitee');
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/w/${DEMO_WS.id}`);
		await page.locator('#invite-email').fill(email);
		await page.getByLabel('Role', { exact: true }).selectOption('viewer');
		await page.getByRole('button', { name: 'Send invitation' }).click();
		await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();
		await expect(page.getByRole('listitem').filter({ hasText: email })).toContainText('viewer');

		const mail = await latestMail(email, /You are invited to/);
		const invitee = await browser.newContext();
		const guest = await invitee.newPage();
		await gotoReady(guest, new URL(linkIn(mail.text)).pathname);
		await expect(guest.getByRole('heading', { name: `Join ${DEMO_WS.name}` })).toBeVisible();
		await guest.getByLabel('Your name').fill('Invited Person (invented)');
		await guest.getByLabel('Password', { exact: true }).fill('invited password 789');
		await guest.getByLabel('Password again').fill('invited password 789');
		await guest.getByRole('button', { name: 'Create account and join' }).click();
		await expect(guest.getByRole('heading', { name: DEMO_WS.name })).toBeVisible();
		await expect(guest.getByText('You are viewer here')).toBeVisible();

		// The link works once.
		await gotoReady(guest, new URL(linkIn(mail.text)).pathname);
		await expect(guest.getByRole('heading', { name: 'This invitation no longer works' })).toBeVisible();
		await invitee.close();

		await page.reload();
		await expect(page.getByRole('listitem').filter({ hasText: 'Invited Person (invented)' })).toBeVisible();
	});

	test('a viewer sees no editing controls, and a forged change is refused with 403', async ({ page }) => {
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, `/w/${DEMO_WS.id}`);
		await expect(page.getByText('You are viewer here')).toBeVisible();
		await expect(page.getByRole('button', { name: 'Send invitation' })).toHaveCount(0);
		await expect(page.getByRole('button', { name: 'Save name' })).toHaveCount(0);

		const origin = new URL(page.url()).origin;
		const res = await page.request.post(`/w/${DEMO_WS.id}?/rename`, {
			form: { name: 'Renamed by a viewer' },
			headers: { origin },
			maxRedirects: 0
		});
		expect(res.status()).toBe(403);
		await page.reload();
		await expect(page.getByRole('heading', { name: DEMO_WS.name })).toBeVisible();
	});

	test('an outsider asking for another workspace gets 404, for pages and for actions', async ({ page }) => {
		await signInWithPassword(page, 'grower@example.org');
		const res = await page.goto(`/w/${DEMO_WS.id}`);
		expect(res?.status()).toBe(404);
		await expect(page.getByRole('heading', { name: 'We could not find that page' })).toBeVisible();
		await expect(page.getByText(DEMO_WS.name)).toHaveCount(0);

		const origin = new URL(page.url()).origin;
		const post = await page.request.post(`/w/${DEMO_WS.id}?/invite`, {
			form: { email: 'x@example.org', role: 'owner' },
			headers: { origin },
			maxRedirects: 0
		});
		expect(post.status()).toBe(404);
		expect(await post.text()).not.toContain(DEMO_WS.name);

		// Their own workspace still opens.
		await gotoReady(page, `/w/${OTHER_WS.id}`);
		await expect(page.getByRole('heading', { name: OTHER_WS.name })).toBeVisible();
	});

	test('the last owner cannot demote themselves', async ({ page }) => {
		await signInWithPassword(page, 'grower@example.org');
		await gotoReady(page, `/w/${OTHER_WS.id}`);
		const me = page.getByRole('listitem').filter({ hasText: '(you)' });
		await me.getByRole('combobox').selectOption('viewer');
		await me.getByRole('button', { name: 'Save role' }).click();
		await expect(page.getByText('A workspace needs an owner')).toBeVisible();
		await page.reload();
		await expect(page.getByText('You are owner here')).toBeVisible();
	});
});
