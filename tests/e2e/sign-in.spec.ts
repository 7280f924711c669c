import { expect, test } from '@playwright/test';
import {
	createWorkspace,
	gotoReady,
	latestMail,
	linkIn,
	signInWithPassword,
	signUp,
	uniqueEmail
} from './helpers';

test.describe('signing up and in', () => {
	test('a new grower signs up, confirms the address from the e-mail with the password and is signed in', async ({
		page
	}) => {
		const email = uniqueEmail('newgrower');
		await signUp(page, email, 'Test Grower (invented)', 'a long test password');

		// The link and the password chosen at sign-up together confirm the account and sign in.
		const mail = await latestMail(email, /Confirm your address/);
		await gotoReady(page, new URL(linkIn(mail.text)).pathname + new URL(linkIn(mail.text)).search);
		await page.getByLabel('Your password').fill('a long test password');
		await page.getByRole('button', { name: 'Confirm and sign in' }).click();
		await expect(page.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();
		await expect(page.getByText('You are not in a workspace yet')).toBeVisible();

		await createWorkspace(page, 'Test greenhouse (invented)');
		await expect(page.getByText('You are owner here')).toBeVisible();
	});

	test('sign-up keeps what was typed and ties each error to its field', async ({ page }) => {
		await gotoReady(page, '/signup');
		await page.getByLabel('Your name').fill('Kept Name');
		await page.getByLabel('E-mail').fill('not-an-address');
		await page.getByLabel('Password', { exact: true }).fill('short');
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(page.getByLabel('E-mail')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('Enter an e-mail address like name@example.org.')).toBeVisible();
		await expect(page.getByText('Use at least 10 characters.')).toBeVisible();
		await expect(page.getByLabel('Your name')).toHaveValue('Kept Name');
		await expect(page.getByLabel('E-mail')).toHaveValue('not-an-address');
	});

	test('a wrong password says so without telling whether the address exists', async ({ page }) => {
		for (const email of ['owner@example.org', uniqueEmail('nobody')]) {
			await gotoReady(page, '/signin');
			await page.locator('#pw-email').fill(email);
			await page.getByLabel('Password', { exact: true }).fill('wrong password here');
			await page.getByRole('button', { name: 'Sign in', exact: true }).click();
			await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible();
			await expect(page.locator('#pw-email')).toHaveValue(email);
		}
	});

	test('a sign-in link from the e-mail signs the owner in', async ({ page }) => {
		await gotoReady(page, '/signin');
		await page.locator('#link-email').fill('owner@example.org');
		await page.getByRole('button', { name: 'E-mail me a link' }).click();
		await expect(page.getByRole('heading', { name: 'Check your e-mail' })).toBeVisible();
		const mail = await latestMail('owner@example.org', /sign-in link/);
		await page.goto(linkIn(mail.text));
		// Sign-in lands on the sites of the owner's only workspace, or on "Your workspaces" once other
		// tests have given the owner more (kept-estimate.spec.ts checks each case on an account of its own).
		await expect(page).toHaveURL(/\/w\/[^/]+\/sites$|\/workspaces$/);
		await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
	});

	test('a forgotten password is reset from the e-mailed link', async ({ page }) => {
		const email = uniqueEmail('forgetful');
		await signUp(page, email, 'Forgetful (invented)', 'first password 123');

		await gotoReady(page, '/forgot');
		await page.getByLabel('E-mail').fill(email);
		await page.getByRole('button', { name: 'Send the reset link' }).click();
		await expect(page.getByText('a reset link is on its way')).toBeVisible();
		const mail = await latestMail(email, /Reset your Runrate password/);
		await gotoReady(page, new URL(linkIn(mail.text)).pathname + new URL(linkIn(mail.text)).search);
		await page.getByLabel('New password', { exact: true }).fill('second password 456');
		await page.getByLabel('New password again').fill('second password 456');
		await page.getByRole('button', { name: 'Save the new password' }).click();
		// Wait for the saved password before signing in: hashing it can take a moment on a busy machine.
		await expect(page.getByText('Your new password is saved. Sign in with it.')).toBeVisible();
		await signInWithPassword(page, email, 'second password 456');
	});

	test('signing out ends the session', async ({ page }) => {
		await signInWithPassword(page, 'editor@example.org');
		await page.getByRole('button', { name: 'Sign out' }).click();
		await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
		await page.goto('/workspaces');
		await expect(page).toHaveURL(/\/signin\?next=/);
	});
});
