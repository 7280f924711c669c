import { expect, test } from '@playwright/test';
import { gotoReady, uniqueEmail } from './helpers';

// Its own user agent, so this test's refusals do not spill into the other tests' sign-ins.
test.use({ userAgent: 'runrate-rate-limit-test' });

test('password guesses against one address are refused after ten tries, with a clear message', async ({
	page
}) => {
	const email = uniqueEmail('guessed');
	await gotoReady(page, '/signin');
	for (let attempt = 1; attempt <= 11; attempt++) {
		await page.locator('#pw-email').fill(email);
		await page.getByLabel('Password', { exact: true }).fill(`guess number ${attempt}`);
		await page.getByRole('button', { name: 'Sign in', exact: true }).click();
		const expected =
			attempt <= 10 ? 'That e-mail and password do not match an account.' : 'Too many attempts.';
		await expect(page.getByText(expected)).toBeVisible();
	}
});
