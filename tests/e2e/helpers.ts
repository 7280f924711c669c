import { expect, type Browser, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';

export const demo = JSON.parse(readFileSync('data/demo-people.json', 'utf8')) as {
	password: string;
	workspaces: { id: string; name: string }[];
};
export const DEMO_PASSWORD = demo.password;
export const DEMO_WS = demo.workspaces[0]!;
export const OTHER_WS = demo.workspaces[1]!;

/** Waits for the root layout's hydration marker, so enhanced forms are live before we click. */
export async function gotoReady(page: Page, path: string) {
	await page.goto(path);
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
}

export async function signInWithPassword(page: Page, email: string, password = DEMO_PASSWORD) {
	await gotoReady(page, '/signin');
	await page.locator('#pw-email').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
	// At phone width "Sign out" sits in the closed Menu: signed in means the button is there, shown or not.
	await expect(page.getByRole('button', { name: 'Sign out', includeHidden: true }).first()).toBeAttached();
	// The server renders the signed-in page before its scripts run: wait for hydration, so the next
	// click reaches an enhanced form on a busy machine too.
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
}

type Captured = { id: number; to: string[]; subject: string; text: string };

/** The newest captured e-mail to `to` whose subject matches, from the local SMTP catcher's JSON view. */
export async function latestMail(to: string, subject: RegExp, after = 0): Promise<Captured> {
	const base = process.env.MAIL_VIEW_URL;
	if (!base) throw new Error('MAIL_VIEW_URL is not set: run the e2e tests through npm test');
	let found: Captured | undefined;
	await expect
		.poll(
			async () => {
				const list = (await (
					await fetch(`${base}/messages?to=${encodeURIComponent(to)}`)
				).json()) as Captured[];
				found = list.filter((m) => m.id > after && subject.test(m.subject)).at(-1);
				return !!found;
			},
			{ timeout: 10_000 }
		)
		.toBe(true);
	return found!;
}

export async function lastMailId(): Promise<number> {
	const list = (await (await fetch(`${process.env.MAIL_VIEW_URL}/messages`)).json()) as Captured[];
	return list.at(-1)?.id ?? 0;
}

export function linkIn(text: string): string {
	const url = text.match(/https?:\/\/\S+/)?.[0];
	if (!url) throw new Error(`no link in: ${text}`);
	return url;
}

export const uniqueEmail = (tag: string) =>
	`${tag}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.org`;

/** A private tariff's editor payload (the tariffs API's body without workspaceId): one flat charge, invented. */
export const inventedTariff = (utility: string, name: string) => ({
	meta: {
		utility,
		name,
		country: 'US',
		customerClass: 'agricultural',
		currency: 'USD',
		timezone: 'America/Chicago',
		holidays: null
	},
	version: { effectiveFrom: '2026-01-01', source: 'Invented for a test', checkedOn: '2026-12-01' },
	structure: { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.12 }] }
});

/** One always-on water pump as the sites API takes it (invented). */
export const rawPump = {
	name: 'Raceway pump',
	category: 'water-pump',
	quantity: 1,
	power: { watts: 370 },
	schedule: { type: 'always' }
};

/** Fills in and sends the sign-up form; the page then asks to confirm the address from the e-mail. */
export async function signUp(page: Page, email: string, name: string, password: string) {
	await gotoReady(page, '/signup');
	await page.getByLabel('Your name').fill(name);
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByLabel('Password again').fill(password);
	await page.getByRole('button', { name: 'Create account' }).click();
	await expect(page.getByRole('heading', { name: 'Confirm your address' })).toBeVisible();
}

/** Sends the password sign-in form without waiting for an outcome (for the refusals). */
export async function sendPasswordSignIn(page: Page, email: string, password: string) {
	await gotoReady(page, '/signin');
	await page.locator('#pw-email').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

/** Signs in with an e-mailed link; for a new address this also creates the (invented) account. */
export async function signInByLink(page: Page, email: string) {
	const after = await lastMailId();
	await gotoReady(page, '/signin');
	await page.locator('#link-email').fill(email);
	await page.getByRole('button', { name: 'E-mail me a link' }).click();
	await expect(page.getByRole('heading', { name: 'Check your e-mail' })).toBeVisible();
	await page.goto(linkIn((await latestMail(email, /sign-in link/, after)).text));
	await expect(page.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();
}

/** Creates a workspace from the workspaces page the person is on; its page then shows its name. */
export async function createWorkspace(page: Page, name: string) {
	await page.getByLabel('Workspace name').fill(name);
	await page.getByRole('button', { name: 'Create workspace' }).click();
	await expect(page.getByRole('heading', { name })).toBeVisible();
}

/**
 * Opens the site invitation e-mailed to `email` in a browser context of its own, creates the guest's
 * account with `name` and `password`, and closes that context once the site's page shows.
 */
export async function acceptSiteInvitation(
	browser: Browser,
	baseURL: string,
	email: string,
	name: string,
	password: string
) {
	const mail = await latestMail(email, /is shared with you/);
	const invite = await (await browser.newContext({ baseURL })).newPage();
	await gotoReady(invite, new URL(linkIn(mail.text)).pathname);
	await invite.getByLabel('Your name').fill(name);
	await invite.getByLabel('Password', { exact: true }).fill(password);
	await invite.getByLabel('Password again').fill(password);
	await invite.getByRole('button', { name: 'Create account and join' }).click();
	await expect(invite.getByRole('heading', { level: 1 })).toBeVisible();
	await invite.context().close();
}
