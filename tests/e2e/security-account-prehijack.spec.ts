import { expect, test, type Browser, type Page } from '@playwright/test';
import {
	createWorkspace,
	gotoReady,
	latestMail,
	linkIn,
	sendPasswordSignIn,
	signInByLink,
	signUp,
	uniqueEmail
} from './helpers';

// Issue 14, item 3: an account taken before its owner signs up. The attacker signs up with the victim's
// address and a password of their own; whatever the victim then does with their mailbox, that password
// must never sign in, and the attacker never sees the victim's workspace. Invented people and addresses.
// Its own user agent, so these sign-ups do not spend the per-client budget of sign-in.spec.
test.use({ userAgent: 'runrate-security-prehijack' });

const ATTACKER_PASSWORD = 'attacker chose this 123';

async function squat(browser: Browser, victim: string): Promise<Page> {
	const page = await (await browser.newContext({ userAgent: 'runrate-security-prehijack' })).newPage();
	await signUp(page, victim, 'Not The Owner (invented)', ATTACKER_PASSWORD);
	return page;
}

/** The victim signs in with an e-mailed link and starts a workspace of their own. */
async function ownerSignsInByLink(page: Page, victim: string, workspace: string) {
	await signInByLink(page, victim);
	await createWorkspace(page, workspace);
}

/** The attacker tries the password they chose: no session, and the victim's workspace stays out of reach. */
async function attackerIsShutOut(page: Page, victim: string, workspace: string) {
	await sendPasswordSignIn(page, victim, ATTACKER_PASSWORD);
	await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible();
	await expect(page.getByRole('button', { name: 'Sign out' })).toHaveCount(0);
	await page.goto('/workspaces');
	await expect(page).toHaveURL(/\/signin\?next=/);
	await expect(page.getByText(workspace)).toHaveCount(0);
}

test('a squatter’s password stops working when the owner signs in with an e-mailed link', async ({
	browser
}) => {
	const victim = uniqueEmail('prehijack-link');
	const workspace = `Owner greenhouse ${Date.now()} (invented)`;
	const attacker = await squat(browser, victim);
	const squatLink = linkIn((await latestMail(victim, /Confirm your address/)).text);

	const owner = await (await browser.newContext()).newPage();
	await ownerSignsInByLink(owner, victim, workspace);
	await attackerIsShutOut(attacker, victim, workspace);

	// The squatting sign-up's own link is void now, whoever opens it.
	await attacker.goto(squatLink);
	await expect(attacker.getByRole('heading', { name: 'This link no longer works' })).toBeVisible();
});

test('the owner opening the squatter’s confirmation link does not confirm the squatter’s password', async ({
	browser
}) => {
	const victim = uniqueEmail('prehijack-confirm');
	const workspace = `Owner nursery ${Date.now()} (invented)`;
	const attacker = await squat(browser, victim);

	const owner = await (await browser.newContext()).newPage();
	const link = new URL(linkIn((await latestMail(victim, /Confirm your address/)).text));
	await gotoReady(owner, link.pathname + link.search);
	await expect(owner.getByRole('heading', { name: 'Finish creating your account' })).toBeVisible();
	// The owner does not know the password someone else chose; the link alone confirms nothing.
	await owner.getByLabel('Your password').fill('what the owner might type');
	await owner.getByRole('button', { name: 'Confirm and sign in' }).click();
	await expect(owner.getByLabel('Your password')).toHaveAttribute('aria-invalid', 'true');
	await expect(owner.getByText('That is not the password chosen for this sign-up.')).toBeVisible();
	await expect(owner.getByLabel('Your password')).toHaveValue('what the owner might type');

	// The squatter still cannot sign in (the address is unconfirmed; a fresh link goes to the owner only).
	await sendPasswordSignIn(attacker, victim, ATTACKER_PASSWORD);
	await expect(attacker.getByText('Confirm your address first')).toBeVisible();
	await expect(attacker.getByRole('button', { name: 'Sign out' })).toHaveCount(0);

	// The page points the owner to an e-mailed sign-in link instead; after it, the squatter is out for good.
	await ownerSignsInByLink(owner, victim, workspace);
	await attackerIsShutOut(attacker, victim, workspace);
});
