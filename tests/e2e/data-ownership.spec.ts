import { expect, test } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import {
	DEMO_WS,
	createWorkspace,
	gotoReady,
	latestMail,
	linkIn,
	signInWithPassword,
	uniqueEmail
} from './helpers';

test.describe('data ownership', () => {
	test('an owner downloads the workspace export as JSON', async ({ page }) => {
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/w/${DEMO_WS.id}`);
		const [file] = await Promise.all([
			page.waitForEvent('download'),
			page.getByRole('link', { name: 'Download export.json' }).click()
		]);
		expect(file.suggestedFilename()).toMatch(/-export-\d{4}-\d{2}-\d{2}\.json$/);
		const data = JSON.parse(await readFile((await file.path())!, 'utf8')) as {
			format: string;
			workspace: { name: string };
		};
		expect(data.format).toBe('runrate-workspace-export');
		expect(data.workspace.name).toBe(DEMO_WS.name);
	});

	test('a viewer is refused the workspace export with 403', async ({ page }) => {
		await signInWithPassword(page, 'viewer@example.org');
		const response = await page.request.get(`/w/${DEMO_WS.id}/export.json`);
		expect(response.status()).toBe(403);
	});

	test('an owner schedules the deletion of a workspace, sees the notice and keeps it', async ({ page }) => {
		const name = `Grace test ${Date.now()} (invented)`;
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, '/workspaces');
		await createWorkspace(page, name);
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

		await page.locator('#ws-confirm').fill(name);
		await page.getByRole('button', { name: 'Delete workspace' }).click();
		await expect(page.getByText('This workspace will be deleted on')).toBeVisible();

		await gotoReady(page, '/workspaces');
		await expect(page.getByRole('listitem').filter({ hasText: name })).toContainText('To be deleted on');

		await page.getByRole('link', { name }).click();
		await page.getByRole('button', { name: 'Keep the workspace' }).click();
		await expect(page.getByText('The workspace is kept.')).toBeVisible();
		await expect(page.getByText('This workspace will be deleted on')).toHaveCount(0);
	});

	test('a person deletes their account and is signed out', async ({ page, browser }) => {
		const name = `Account test ${Date.now()} (invented)`;
		const email = uniqueEmail('leaver');
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, '/workspaces');
		await createWorkspace(page, name);
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
		await page.locator('#invite-email').fill(email);
		await page.getByLabel('Role', { exact: true }).selectOption('viewer');
		await page.getByRole('button', { name: 'Send invitation' }).click();
		await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();

		const mail = await latestMail(email, /You are invited to/);
		const context = await browser.newContext();
		const guest = await context.newPage();
		await gotoReady(guest, new URL(linkIn(mail.text)).pathname);
		await guest.getByLabel('Your name').fill('Leaving Person (invented)');
		await guest.getByLabel('Password', { exact: true }).fill('leaving password 789');
		await guest.getByLabel('Password again').fill('leaving password 789');
		await guest.getByRole('button', { name: 'Create account and join' }).click();
		await expect(guest.getByText('You are viewer here')).toBeVisible();

		await gotoReady(guest, '/workspaces');
		await guest.getByRole('link', { name: 'Your account' }).click();
		await expect(guest.locator('dd', { hasText: email })).toBeVisible();
		await expect(guest.locator('body[data-hydrated="true"]')).toBeAttached();
		await guest.getByLabel('Your e-mail address').fill('someone-else@example.org');
		await guest.getByRole('button', { name: 'Delete my account' }).click();
		await expect(guest.getByText('Type your e-mail address exactly to confirm.')).toBeVisible();
		await guest.getByLabel('Your e-mail address').fill(email);
		await guest.getByRole('button', { name: 'Delete my account' }).click();
		await expect(guest.getByRole('heading', { name: 'Your account is deleted' })).toBeVisible();
		await expect(guest.getByRole('button', { name: 'Sign out' })).toHaveCount(0);
		await context.close();

		await page.reload();
		await expect(page.getByRole('listitem').filter({ hasText: 'Leaving Person (invented)' })).toHaveCount(0);
	});
});
