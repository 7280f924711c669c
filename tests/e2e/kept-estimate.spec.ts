import { expect, test } from '@playwright/test';
import { createWorkspace, gotoReady, latestMail, linkIn, signUp, uniqueEmail } from './helpers';

// Issue 17: the grower's first steps. The quick estimate goes with the sign-up, survives the e-mail
// confirmation and becomes the first site; afterwards sign-in lands on that workspace's sites.
test.use({ timezoneId: 'America/Denver', locale: 'en-US' });

test('a quick estimate kept at sign-up becomes the first site, and sign-in then lands on its sites', async ({
	page
}) => {
	const email = uniqueEmail('kept-estimate');
	const password = 'a long grower password';
	await gotoReady(page, '/');
	await page.getByLabel('Name', { exact: true }).fill('Sump pump (invented)');
	await page.getByLabel('Amps (A)').fill('2.5');
	await page.getByRole('link', { name: 'Keep it as a site: create an account' }).click();

	// Back from sign-up finds the estimate as it was; forward again to the sign-up that carries it.
	await expect(page.getByRole('heading', { name: 'Your estimate comes with you' })).toBeVisible();
	await page.goBack();
	await expect(page.getByLabel('Amps (A)')).toHaveValue('2.5');
	await page.goForward();
	const kept = page.getByRole('region', { name: 'Your estimate comes with you' });
	await expect(kept).toContainText('1 × Sump pump (invented), 300 W each, always on');
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

	await page.getByLabel('Your name').fill('Kept Grower (invented)');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByLabel('Password again').fill(password);
	await page.getByLabel('Name of your first site').fill('Mesa tanks (invented)');
	await expect(page.getByLabel('Country of the site (two letters)')).toHaveValue('US');
	await page.getByRole('button', { name: 'Create account' }).click();
	await expect(page.getByRole('heading', { name: 'Confirm your address' })).toBeVisible();
	await expect(page.getByRole('link', { name: 'this link to the estimate' })).toBeVisible();

	const mail = await latestMail(email, /Confirm your address/);
	const link = new URL(linkIn(mail.text));
	await gotoReady(page, link.pathname + link.search);
	await page.getByLabel('Your password').fill(password);
	await page.getByRole('button', { name: 'Confirm and sign in' }).click();
	await expect(page.getByText('Your estimate is now the site “Mesa tanks (invented)”.')).toBeVisible();
	await expect(page.getByText('Mountain Time (America/Denver)')).toBeVisible();

	await page.getByRole('link', { name: 'Open the site' }).click();
	await expect(page.getByRole('heading', { name: 'Mesa tanks (invented)', level: 1 })).toBeVisible();
	await expect(page.getByText('Sump pump (invented)').first()).toBeVisible();

	// Signed out and in again: one workspace, so sign-in lands on its sites list, one click from the site.
	await page.context().clearCookies();
	await gotoReady(page, '/signin');
	await page.locator('#pw-email').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
	await expect(page.getByRole('heading', { name: 'Sites', level: 1 })).toBeVisible();
	await expect(page).toHaveURL(/\/w\/[^/]+\/sites$/);
	await expect(page.getByRole('link', { name: 'Mesa tanks (invented)' })).toBeVisible();

	// Outside the workspace too, the main navigation's "Sites" goes to the only workspace's sites.
	const sitesUrl = new URL(page.url()).pathname;
	await gotoReady(page, '/tariffs');
	await expect(
		page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' })
	).toHaveAttribute('href', sitesUrl);
});

test('a person in several workspaces lands on "Your workspaces", where "Sites" is the way in', async ({
	page
}) => {
	const email = uniqueEmail('two-farms');
	const password = 'a long adviser password';
	await signUp(page, email, 'Two Farms (invented)', password);
	const link = new URL(linkIn((await latestMail(email, /Confirm your address/)).text));
	await gotoReady(page, link.pathname + link.search);
	await page.getByLabel('Your password').fill(password);
	await page.getByRole('button', { name: 'Confirm and sign in' }).click();
	// No workspace yet: the workspaces page, where one is made.
	await expect(page.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
	for (const name of ['North farm (invented)', 'South farm (invented)']) {
		await gotoReady(page, '/workspaces');
		await createWorkspace(page, name);
	}
	await page.context().clearCookies();
	await gotoReady(page, '/signin');
	await page.locator('#pw-email').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
	await expect(page.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();
	const sites = page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' });
	await expect(sites).toHaveAttribute('href', '/workspaces');
});
