import { expect, test } from '@playwright/test';
import { BASE, DEMO, freshEmail, linkIn, signInPage, waitForMail } from './helpers';

// One whole story in the browser: the owner signs in and invites a colleague by e-mail; the mail
// is caught by the local SMTP server (the owner's outbox does not show it: it is not theirs); the colleague follows the link, creates an account and joins; the
// owner promotes them; the colleague can now create an API token; the activity log tells it all.
test('owner invites a colleague by e-mail, the colleague joins, the owner changes their role', async ({
	page,
	browser
}) => {
	const email = freshEmail('newhire');

	await signInPage(page, DEMO.owner);
	await page
		.getByRole('link', { name: /Brindlemoor Thermal Works/ })
		.first()
		.click();
	await expect(page.getByRole('heading', { name: 'Brindlemoor Thermal Works' })).toBeVisible();
	await page.getByRole('link', { name: 'Manage team' }).click();
	await expect(page).toHaveURL(/\/t\/brindlemoor\/settings$/);

	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Role', { exact: true }).selectOption('viewer');
	await page.getByRole('button', { name: 'Send invitation' }).click();
	await expect(page.getByText(`Invitation sent to ${email}`)).toBeVisible();
	await expect(page.getByTestId('invites').locator(`tr[data-invite="${email}"]`)).toContainText(
		'Viewer'
	);

	// the mail, as the fake SMTP server caught it; the owner's own outbox does not show it
	const mail = await waitForMail(
		email,
		'Maren Okafor invited you to Brindlemoor Thermal Works on Statewright'
	);
	expect(mail.text).toContain('as viewer');
	const link = linkIn(mail, `${BASE}/invite/`);
	await page.getByRole('link', { name: 'Outbox' }).click();
	await expect(page.getByRole('heading', { name: 'Your outbox' })).toBeVisible();
	await expect(page.getByText('invited you to Brindlemoor')).toHaveCount(0);
	expect(link).toMatch(new RegExp(`^${BASE}/invite/[A-Za-z0-9_-]{43}$`));

	// the colleague, in their own browser
	const theirs = await browser.newContext();
	const colleague = await theirs.newPage();
	await colleague.goto(link!);
	await expect(
		colleague.getByRole('heading', { name: 'Join Brindlemoor Thermal Works' })
	).toBeVisible();
	await expect(colleague.getByText('Maren Okafor')).toBeVisible();
	await colleague.getByRole('link', { name: 'Create an account' }).click();
	await expect(colleague.getByLabel('E-mail')).toHaveValue(email);
	await colleague.getByLabel('Name').fill('Noor Haddad');
	await colleague.getByLabel('Password').fill('a long enough password');
	await colleague.getByRole('button', { name: 'Create account' }).click();
	await colleague
		.getByRole('button', { name: 'Accept and join Brindlemoor Thermal Works' })
		.click();
	await expect(colleague.getByText('You joined as viewer.')).toBeVisible();
	await expect(colleague.getByTestId('member-summary')).toContainText('Noor Haddad');

	// the invitation is used up
	const stranger = await browser.newContext();
	const strangerPage = await stranger.newPage();
	await strangerPage.goto(link!);
	await expect(strangerPage.getByText('This invitation has already been used.')).toBeVisible();
	await stranger.close();

	// as a viewer there is nothing to manage and no tokens to make
	await colleague.goto('/t/brindlemoor/settings');
	await expect(colleague.getByRole('heading', { name: 'API tokens' })).toHaveCount(0);

	// the owner promotes the colleague to designer
	await page.goto('/t/brindlemoor/settings');
	const row = page.getByTestId('members').locator(`tr[data-member="${email}"]`);
	await expect(row).toContainText('Noor Haddad');
	await row.getByLabel('Role of Noor Haddad').selectOption('designer');
	await row.getByRole('button', { name: 'Set' }).click();
	await expect(page.getByText('Role changed.')).toBeVisible();
	await expect(row.getByLabel('Role of Noor Haddad')).toHaveValue('designer');

	// the colleague now has the designer's tools
	await colleague.reload();
	await expect(colleague.getByRole('heading', { name: 'API tokens' })).toBeVisible();
	await colleague.getByLabel('Name', { exact: true }).fill('memo export');
	await colleague.getByRole('button', { name: 'Create token' }).click();
	await expect(colleague.getByText('Token “memo export” created')).toBeVisible();
	const token = await colleague.getByTestId('secret-value').textContent();
	expect(token).toMatch(/^swt_[A-Za-z0-9_-]{43}$/);
	const api = await colleague.request.get('/api/v1/me', {
		headers: { authorization: `Bearer ${token}` }
	});
	expect(await api.json()).toMatchObject({
		kind: 'token',
		token: { role: 'viewer' },
		team: { slug: 'brindlemoor' }
	});

	// the owner's activity list tells the story, newest first
	await page.reload();
	const activity = page.getByTestId('activity');
	await expect(activity.locator('li').nth(0)).toHaveText(
		/Noor Haddad created the viewer token “memo export”/
	);
	await expect(activity.locator('li').nth(1)).toHaveText(
		/Maren Okafor changed Noor Haddad's role from viewer to designer/
	);
	await expect(activity.locator('li').nth(2)).toHaveText(/Noor Haddad joined as viewer/);
	await expect(activity.locator('li').nth(3)).toHaveText(
		new RegExp(`Maren Okafor invited ${email.replace(/\./g, '\\.')} as viewer`)
	);
	await theirs.close();
});
