import {
	expect,
	request as playwrightRequest,
	test,
	type APIRequestContext
} from '@playwright/test';
import {
	BASE,
	createToken,
	DEMO,
	freshEmail,
	memberId,
	FORM,
	signedInRequest,
	signedUpRequest,
	TEAM
} from './helpers';

// Every role against every team route: pages, form actions and API routes, as the built app
// answers them over HTTP. Expectations are written out here by hand from the product's role table.

type Who = 'owner' | 'designer' | 'checker' | 'viewer' | 'outsider' | 'anonymous';
const MEMBERS = ['owner', 'designer', 'checker', 'viewer'] as const;
const EVERYONE: Who[] = [...MEMBERS, 'outsider', 'anonymous'];

const ctx = {} as Record<Who, APIRequestContext>;
let outsiderTeam = '';

test.describe.configure({ mode: 'serial' });

test.beforeAll(async () => {
	for (const role of MEMBERS) ctx[role] = await signedInRequest(DEMO[role]);
	ctx.outsider = await signedUpRequest('Otto Outside', freshEmail('outsider'));
	const created = await ctx.outsider.post('/?/createTeam', {
		form: { name: 'Outside Heat Exchange' },
		headers: FORM,
		maxRedirects: 0
	});
	expect(created.status()).toBe(303);
	outsiderTeam = created.headers()['location'].replace('/t/', '');
	ctx.anonymous = await playwrightRequest.newContext({ baseURL: BASE });
});

test.afterAll(async () => {
	for (const c of Object.values(ctx)) await c.dispose();
});

/** What a non-member and a signed-out visitor get, whatever the route. */
function outsiders(kind: 'page' | 'api'): Record<'outsider' | 'anonymous', number> {
	return { outsider: 404, anonymous: kind === 'page' ? 303 : 401 };
}

test.describe('pages under /t/[team]', () => {
	for (const path of [`/t/${TEAM}`, `/t/${TEAM}/settings`]) {
		test(`GET ${path}`, async () => {
			const expected: Record<Who, number> = {
				owner: 200,
				designer: 200,
				checker: 200,
				viewer: 200,
				...outsiders('page')
			};
			const got: Partial<Record<Who, number>> = {};
			for (const who of EVERYONE)
				got[who] = (await ctx[who].get(path, { maxRedirects: 0 })).status();
			expect(got).toEqual(expected);
			const anon = await ctx.anonymous.get(path, { maxRedirects: 0 });
			expect(anon.headers()['location']).toBe(`/signin?next=${encodeURIComponent(path)}`);
		});
	}

	test('settings shows each role only the sections it may use', async () => {
		const sections = async (who: Who) => {
			const html = await (await ctx[who].get(`/t/${TEAM}/settings`)).text();
			return ['Invite someone', 'API tokens', 'Team details', 'Activity'].filter((s) =>
				html.includes(`>${s}</h2>`)
			);
		};
		expect(await sections('owner')).toEqual([
			'Invite someone',
			'API tokens',
			'Team details',
			'Activity'
		]);
		expect(await sections('designer')).toEqual(['API tokens']);
		expect(await sections('checker')).toEqual([]);
		expect(await sections('viewer')).toEqual([]);
	});
});

test.describe('form actions on team settings (an empty form: allowed → 400 asking for the fields, refused → 403/404/303)', () => {
	const ACTIONS: Array<[string, readonly Who[]]> = [
		['rename', ['owner']],
		['invite', ['owner']],
		['revokeInvite', ['owner']],
		['changeRole', ['owner']],
		['removeMember', ['owner']],
		['createToken', ['owner', 'designer']],
		['revokeToken', ['owner', 'designer']],
		['leave', MEMBERS]
	];
	for (const [action, allowed] of ACTIONS) {
		test(`POST ?/${action}: ${allowed.join(', ')}`, async () => {
			const expected = Object.fromEntries(
				EVERYONE.map((who) => [
					who,
					allowed.includes(who) ? 400 : who === 'outsider' ? 404 : who === 'anonymous' ? 303 : 403
				])
			);
			const got: Record<string, number> = {};
			for (const who of EVERYONE) {
				got[who] = (
					await ctx[who].post(`/t/${TEAM}/settings?/${action}`, {
						form: {},
						headers: FORM,
						maxRedirects: 0
					})
				).status();
			}
			expect(got).toEqual(expected);
		});
	}

	test('a refused action says which role could do it', async () => {
		const res = await ctx.checker.post(`/t/${TEAM}/settings?/invite`, {
			form: { email: 'x@example.com', role: 'viewer' },
			headers: FORM
		});
		expect(res.status()).toBe(403);
		expect(await res.text()).toContain(
			'Your role in this team is checker, which cannot manage the team (owners can).'
		);
	});
});

test.describe('API routes', () => {
	for (const path of [`/api/v1/teams/${TEAM}`, `/api/v1/teams/${TEAM}/members`]) {
		test(`GET ${path}`, async () => {
			const expected: Record<Who, number> = {
				owner: 200,
				designer: 200,
				checker: 200,
				viewer: 200,
				...outsiders('api')
			};
			const got: Partial<Record<Who, number>> = {};
			for (const who of EVERYONE) got[who] = (await ctx[who].get(path)).status();
			expect(got).toEqual(expected);
			const body = await (await ctx.outsider.get(path)).json();
			expect(body).toEqual({
				error: {
					code: 'not-found',
					message: 'There is no such team here, or you are not a member of it.'
				}
			});
		});
	}

	test('each member sees their own role', async () => {
		for (const role of MEMBERS) {
			const body = await (await ctx[role].get(`/api/v1/teams/${TEAM}`)).json();
			expect(body.role).toBe(role);
		}
		// other journeys may add people to the demo team; the four demo people keep their roles
		const { members } = (await (await ctx.viewer.get(`/api/v1/teams/${TEAM}/members`)).json()) as {
			members: Array<{ email: string; role: string }>;
		};
		for (const role of MEMBERS)
			expect(members.find((m) => m.email === DEMO[role])?.role, role).toBe(role);
	});

	test('GET /api/v1/me needs a principal', async () => {
		expect((await ctx.anonymous.get('/api/v1/me')).status()).toBe(401);
		const me = await (await ctx.designer.get('/api/v1/me')).json();
		expect(me).toMatchObject({
			kind: 'user',
			user: { email: DEMO.designer },
			teams: [{ slug: TEAM, role: 'designer' }]
		});
	});
});

test.describe('API tokens', () => {
	test('a token reaches its own team with its role, nothing else, and stops when revoked', async () => {
		const token = await createToken(ctx.owner, TEAM, 'e2e reader', 'viewer');
		const auth = { authorization: `Bearer ${token}` };
		const me = await ctx.anonymous.get('/api/v1/me', { headers: auth });
		expect(me.status()).toBe(200);
		expect(await me.json()).toMatchObject({
			kind: 'token',
			token: { name: 'e2e reader', role: 'viewer' },
			team: { slug: TEAM }
		});
		const team = await ctx.anonymous.get(`/api/v1/teams/${TEAM}`, { headers: auth });
		expect((await team.json()).role).toBe('viewer');
		expect(
			(await ctx.anonymous.get(`/api/v1/teams/${outsiderTeam}`, { headers: auth })).status()
		).toBe(404);
		// tokens are for the API only: a page ignores them
		const page = await ctx.anonymous.get(`/t/${TEAM}`, { headers: auth, maxRedirects: 0 });
		expect(page.status()).toBe(303);
		// last used is recorded and shown
		const settings = await (await ctx.owner.get(`/t/${TEAM}/settings`)).text();
		const row = settings.split('<tr').find((r) => r.includes('data-token="e2e reader"'))!;
		expect(row).toContain(token.slice(0, 10));
		expect(row).not.toContain(token);
		expect(row).not.toContain('never');
		// revoke
		const id = row.match(/name="id" value="([a-z2-9]{16})"/)![1];
		expect(
			(
				await ctx.owner.post(`/t/${TEAM}/settings?/revokeToken`, { form: { id }, headers: FORM })
			).status()
		).toBe(200);
		const after = await ctx.anonymous.get('/api/v1/me', { headers: auth });
		expect(after.status()).toBe(401);
		expect((await after.json()).error.code).toBe('invalid-token');
	});

	test('a malformed Authorization header is refused, not ignored', async () => {
		for (const header of ['Basic dXNlcjpwYXNz', 'Bearer', 'Bearer swt_tooshort']) {
			const res = await ctx.viewer.get('/api/v1/me', { headers: { authorization: header } });
			expect(res.status(), header).toBe(401);
		}
	});

	test('nobody mints a token above their own role', async () => {
		const designerOwnerToken = await ctx.designer.post(`/t/${TEAM}/settings?/createToken`, {
			form: { name: 'sneaky', role: 'owner' },
			headers: FORM
		});
		expect(designerOwnerToken.status()).toBe(403);
		expect(await designerOwnerToken.text()).toContain(
			'you can create tokens with these roles: designer, viewer'
		);
		const checkerToken = await ctx.checker.post(`/t/${TEAM}/settings?/createToken`, {
			form: { name: 'c', role: 'viewer' },
			headers: FORM
		});
		expect(checkerToken.status()).toBe(403);
		const designerToken = await createToken(ctx.designer, TEAM, 'designer script', 'designer');
		const res = await ctx.anonymous.get(`/api/v1/teams/${TEAM}`, {
			headers: { authorization: `Bearer ${designerToken}` }
		});
		expect((await res.json()).role).toBe('designer');
	});
});

test.describe('escalation and tampering', () => {
	test('a designer cannot make themself owner', async () => {
		const self = await memberId(ctx.owner, TEAM, DEMO.designer);
		const res = await ctx.designer.post(`/t/${TEAM}/settings?/changeRole`, {
			form: { id: self, role: 'owner' },
			headers: FORM
		});
		expect(res.status()).toBe(403);
		expect((await (await ctx.designer.get(`/api/v1/teams/${TEAM}`)).json()).role).toBe('designer');
	});

	test('a viewer cannot invite, even as owner', async () => {
		const res = await ctx.viewer.post(`/t/${TEAM}/settings?/invite`, {
			form: { email: freshEmail('crony'), role: 'owner' },
			headers: FORM
		});
		expect(res.status()).toBe(403);
	});

	test('made-up roles and ids are refused with a message', async () => {
		const badRole = await ctx.owner.post(`/t/${TEAM}/settings?/invite`, {
			form: { email: freshEmail('x'), role: 'superuser' },
			headers: FORM
		});
		expect(badRole.status()).toBe(400);
		expect(await badRole.text()).toContain('Choose a role: owner, designer, checker, viewer.');
		const badId = await ctx.owner.post(`/t/${TEAM}/settings?/changeRole`, {
			form: { id: "1' OR '1'='1", role: 'viewer' },
			headers: FORM
		});
		expect(badId.status()).toBe(400);
		expect(await badId.text()).toContain('That id is not valid.');
	});

	test('ids from another team do not reach across', async () => {
		const stranger = await memberId(
			ctx.outsider,
			outsiderTeam,
			(await (await ctx.outsider.get('/api/v1/me')).json()).user.email
		);
		for (const action of ['changeRole', 'removeMember']) {
			const res = await ctx.owner.post(`/t/${TEAM}/settings?/${action}`, {
				form: { id: stranger, role: 'viewer' },
				headers: FORM
			});
			expect(res.status(), action).toBe(404);
			expect(await res.text()).toContain('That person is not a member of this team.');
		}
		// the stranger is still the owner of their own team
		expect((await (await ctx.outsider.get(`/api/v1/teams/${outsiderTeam}`)).json()).role).toBe(
			'owner'
		);
		// and an owner of one team is nobody in another
		const across = await ctx.owner.post(`/t/${outsiderTeam}/settings?/rename`, {
			form: { name: 'Taken over' },
			headers: FORM,
			maxRedirects: 0
		});
		expect(across.status()).toBe(404);
	});

	test('tampered team names are plain 404s', async () => {
		for (const path of [
			'/t/BRINDLEMOOR',
			'/t/brindlemoor%2F..%2Fsettings',
			'/t/-x-',
			"/t/brindlemoor'--",
			`/t/${'a'.repeat(41)}`,
			'/t/brindlemoor/settings/../../x'
		]) {
			expect((await ctx.owner.get(path, { maxRedirects: 0 })).status(), path).toBe(404);
		}
	});

	test('the last owner cannot step down or leave', async () => {
		const self = await memberId(ctx.owner, TEAM, DEMO.owner);
		const demote = await ctx.owner.post(`/t/${TEAM}/settings?/changeRole`, {
			form: { id: self, role: 'viewer' },
			headers: FORM
		});
		expect(demote.status()).toBe(409);
		expect(await demote.text()).toContain('A team needs at least one owner.');
		const leave = await ctx.owner.post(`/t/${TEAM}/settings?/leave`, {
			form: { confirm: 'yes' },
			headers: FORM,
			maxRedirects: 0
		});
		expect(leave.status()).toBe(409);
		expect((await (await ctx.owner.get(`/api/v1/teams/${TEAM}`)).json()).role).toBe('owner');
	});

	test('form posts from another site are refused', async () => {
		const res = await ctx.owner.post(`/t/${TEAM}/settings?/rename`, {
			form: { name: 'Hijacked' },
			headers: { ...FORM, origin: 'https://evil.example' }
		});
		expect(res.status()).toBe(403);
		expect((await (await ctx.owner.get(`/api/v1/teams/${TEAM}`)).json()).team.name).toBe(
			'Brindlemoor Thermal Works'
		);
	});
});
