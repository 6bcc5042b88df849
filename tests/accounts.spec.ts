import { expect, test } from '@playwright/test';
import {
	BASE,
	DEMO,
	DEMO_PASSWORD,
	freshEmail,
	lastMailId,
	linkIn,
	FORM,
	signInPage,
	signUpPage,
	waitForMail
} from './helpers';

test.describe('accounts', () => {
	test('sign up, confirm the address from the mail (which signs in), sign out and sign in again', async ({
		page
	}) => {
		const email = freshEmail('ines');
		await page.goto('/signup');
		await page.getByLabel('Name').fill('Ines Duarte');
		await page.getByLabel('E-mail').fill(email);
		await page.getByLabel('Password').fill('a long enough password');
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();
		await expect(page.getByText(email)).toBeVisible();
		// not signed in until the address is confirmed
		await page.goto('/account');
		await expect(page).toHaveURL(/\/signin\?next=%2Faccount$/);

		const mail = await waitForMail(email, 'Confirm your e-mail address');
		await page.goto(linkIn(mail, `${BASE}/verify?token=`));
		await expect(page.getByText('Address confirmed')).toBeVisible();
		await page.getByRole('link', { name: 'Go to your teams' }).click();
		await expect(page.getByRole('heading', { name: 'Your teams' })).toBeVisible();
		await expect(page.getByRole('heading', { name: 'Start a team' })).toBeVisible();
		await expect(page.getByText('Confirm your e-mail address')).toHaveCount(0);

		await page.getByRole('button', { name: 'Sign out' }).click();
		await expect(page).toHaveURL(/\/signin$/);
		await page.goto('/account');
		await expect(page).toHaveURL(/\/signin\?next=%2Faccount$/);
		await page.getByLabel('E-mail').fill(email.toUpperCase());
		await page.getByLabel('Password').fill('a long enough password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page).toHaveURL(/\/account$/);
		await expect(page.getByRole('heading', { name: 'Ines Duarte' })).toBeVisible();
	});

	test('sign-up refuses a bad address and a short password, keeping what was typed, and answers a taken address as a new one', async ({
		page
	}) => {
		await page.goto('/signup');
		await page.getByLabel('Name').fill('Short Pass');
		await page.getByLabel('E-mail').fill(freshEmail('short'));
		await page.getByLabel('Password').fill('tooshort');
		// the browser's own minlength check would stop a real user; submit past it to reach the server
		await page.locator('form').evaluate((f: HTMLFormElement) => f.setAttribute('novalidate', ''));
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(
			page.getByText('Use at least 10 characters for the password.').first()
		).toBeVisible();
		await expect(page.getByLabel('Name')).toHaveValue('Short Pass');

		await page.getByLabel('E-mail').fill('not-an-address');
		await page.getByLabel('Password').fill('a long enough password');
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(
			page.getByText('Enter an e-mail address like name@example.com.').first()
		).toBeVisible();

		const after = await lastMailId(DEMO.viewer);
		await page.getByLabel('E-mail').fill(DEMO.viewer);
		await page.getByRole('button', { name: 'Create account' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();
		await expect(page.getByText('already exists')).toHaveCount(0);
		// the owner of the address is told, with a way back in
		const notice = await waitForMail(DEMO.viewer, 'Someone tried to sign up', after);
		expect(linkIn(notice, `${BASE}/reset`)).toBe(`${BASE}/reset`);
	});

	test('a wrong password is refused with a clear message', async ({ page }) => {
		await page.goto('/signin');
		await page.getByLabel('E-mail').fill(DEMO.checker);
		await page.getByLabel('Password').fill('not the demo password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('alert')).toContainText(
			'That e-mail address and password do not match an account'
		);
		await expect(page).toHaveURL(/\/signin$/);
		await expect(page.getByLabel('E-mail')).toHaveValue(DEMO.checker);
	});

	test('reset the password by e-mail: follow the link, set a new password, the old one stops working', async ({
		page,
		browser
	}) => {
		const email = freshEmail('forgetful');
		const other = await browser.newContext();
		const otherPage = await other.newPage();
		await signUpPage(otherPage, 'Fer Getful', email, 'the old password');

		await page.goto('/signin');
		await page.getByRole('link', { name: 'Forgot the password?' }).click();
		// the sign-in form has an E-mail field too: wait until the reset page has replaced it
		await expect(page.getByRole('heading', { name: 'Reset your password' })).toBeVisible();
		await page.getByLabel('E-mail').fill(email);
		await page.getByRole('button', { name: 'Send reset link' }).click();
		await expect(page.getByText('Check your mail')).toBeVisible();

		const mail = await waitForMail(email, 'Reset your Statewright password');
		const link = linkIn(mail, `${BASE}/reset?token=`);
		await page.goto(link);
		await page.getByLabel('New password').fill('the new password');
		await page.getByLabel('The same again').fill('the new password');
		await page.getByRole('button', { name: 'Set password and sign in' }).click();
		await expect(page).toHaveURL(/\/account\?password=reset$/);
		await expect(page.getByText('Your password was reset')).toBeVisible();

		// the session that was open elsewhere has ended
		await otherPage.goto('/account');
		await expect(otherPage).toHaveURL(/\/signin/);
		await other.close();

		// the link works once
		await page.goto(link);
		await expect(page.getByText('This reset link was already used')).toBeVisible();

		await page.getByRole('button', { name: 'Sign out' }).click();
		await expect(page).toHaveURL(/\/signin$/);
		await page.getByLabel('E-mail').fill(email);
		await page.getByLabel('Password').fill('the old password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('alert')).toContainText('do not match');
		await page.getByLabel('Password').fill('the new password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('heading', { name: 'Your teams' })).toBeVisible();
	});

	test('a reset request for an unknown address looks the same and sends nothing', async ({
		request
	}) => {
		const res = await request.post('/reset?/request', {
			form: { email: freshEmail('ghost') },
			headers: FORM
		});
		expect(res.status()).toBe(200);
		expect(await res.text()).toContain('a reset link is on its way');
	});

	test('a made-up reset or confirmation link is refused', async ({ page }) => {
		await page.goto('/reset?token=made-up');
		await expect(page.getByText('This reset link is not valid')).toBeVisible();
		await page.goto('/verify?token=made-up');
		await expect(page.getByText('This confirmation link is not valid')).toBeVisible();
	});

	test('sign out everywhere ends every session of the account', async ({ page, browser }) => {
		const email = freshEmail('everywhere');
		await signUpPage(page, 'Every Where', email);
		const second = await browser.newContext();
		const secondPage = await second.newPage();
		await signInPage(secondPage, email, 'a long enough password');
		await page.goto('/account');
		await expect(page.getByTestId('sessions').locator('tbody tr')).toHaveCount(2);
		await page.getByTestId('signout-everywhere').click();
		await expect(page).toHaveURL(/\/signin$/);
		await secondPage.goto('/account');
		await expect(secondPage).toHaveURL(/\/signin/);
		await second.close();
	});

	test('the session cookie is HttpOnly and SameSite=Lax; without https it is not Secure', async ({
		request
	}) => {
		const res = await request.post('/signin', {
			form: { email: DEMO.viewer, password: DEMO_PASSWORD },
			headers: FORM,
			maxRedirects: 0
		});
		const cookie = res.headers()['set-cookie'];
		expect(cookie).toMatch(/^statewright_session=[a-z0-9]{40};/);
		expect(cookie).toMatch(/HttpOnly/i);
		expect(cookie).toMatch(/SameSite=Lax/i);
		expect(cookie).not.toMatch(/Secure/i);
	});
});
