import { expect, test, type Browser, type Page } from '@playwright/test';
import {
	gotoReady,
	lastMailId,
	latestMail,
	linkIn,
	signInByLink,
	signInWithPassword,
	uniqueEmail
} from './helpers';

// Issue 14, item 6: sessions that end. A copied session cookie used to keep working for its whole 30 days
// after sign-out, a password reset left other sessions alive and an older reset link still worked after a
// newer one was used. Every check here is immediate: no waiting out the per-process token cache.

const newPage = async (browser: Browser) => (await browser.newContext()).newPage();

async function isSignedOut(page: Page) {
	await page.goto('/workspaces');
	await expect(page).toHaveURL(/\/signin\?next=/);
}

async function resetLink(page: Page, email: string): Promise<string> {
	const after = await lastMailId();
	await gotoReady(page, '/forgot');
	await page.getByLabel('E-mail').fill(email);
	await page.getByRole('button', { name: 'Send the reset link' }).click();
	await expect(page.getByText('a reset link is on its way')).toBeVisible();
	const url = new URL(linkIn((await latestMail(email, /Reset your Runrate password/, after)).text));
	return url.pathname + url.search;
}

async function chooseNewPassword(page: Page, link: string, password: string) {
	await gotoReady(page, link);
	await page.getByLabel('New password', { exact: true }).fill(password);
	await page.getByLabel('New password again').fill(password);
	await page.getByRole('button', { name: 'Save the new password' }).click();
}

test('a session cookie copied before sign-out no longer signs anyone in after it', async ({ browser }) => {
	const page = await newPage(browser);
	await signInWithPassword(page, 'editor@example.org');
	const copied = await page.context().cookies();
	expect(copied.some((c) => c.name.includes('authjs.session-token'))).toBe(true);

	const thief = await (await browser.newContext()).newPage();
	await thief.context().addCookies(copied);
	await gotoReady(thief, '/workspaces');
	await expect(thief.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();

	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
	await isSignedOut(thief);
	// The cookie exactly as copied (not the one the thief's browser renewed) is refused too.
	const replay = await (await browser.newContext()).newPage();
	await replay.context().addCookies(copied);
	await isSignedOut(replay);
});

test('“Sign out everywhere” on the account page ends the sessions of other browsers too', async ({
	browser
}) => {
	const email = uniqueEmail('everywhere');
	const laptop = await newPage(browser);
	const phone = await newPage(browser);
	await signInByLink(laptop, email);
	await signInByLink(phone, email);

	await gotoReady(laptop, '/account');
	await laptop.getByRole('button', { name: 'Sign out everywhere' }).click();
	await expect(laptop.getByRole('heading', { name: 'You are signed out everywhere' })).toBeVisible();
	await isSignedOut(phone);
	await isSignedOut(laptop);
	// Signing in again works as before.
	await signInByLink(phone, email);
});

test('a password reset ends the other sessions, and an older reset link is refused after a newer one', async ({
	browser
}) => {
	const email = uniqueEmail('reset-ends');
	const elsewhere = await newPage(browser);
	await signInByLink(elsewhere, email);

	const page = await newPage(browser);
	const older = await resetLink(page, email);
	const newer = await resetLink(page, email);
	expect(newer).not.toBe(older);
	await chooseNewPassword(page, newer, 'chosen after the reset 1');
	await expect(page.getByText('Your new password is saved. Sign in with it.')).toBeVisible();
	await isSignedOut(elsewhere);

	await chooseNewPassword(page, older, 'someone else’s choice 2');
	await expect(page.getByText('This reset link has been used already or has expired.')).toBeVisible();
	await signInWithPassword(page, email, 'chosen after the reset 1');
});
