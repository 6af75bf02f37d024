import { invitationSchema, outboxResponseSchema } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTeam, registerUser, startTestApp, TEST_PASSWORD, uniqueEmail, type SignedInUser, type TestApp } from './support/test-app';

/** The token in the link of the newest message to `email`, as the fake SMTP server received it. */
function tokenFromOutbox(testApp: TestApp, email: string): string {
  const message = testApp.smtp.messages().find((candidate) => candidate.to === email);
  const link = /http:\/\/tallus\.test:4300\/invitations\/accept\?token=([\w-]+)/.exec(message?.text ?? '');
  if (!link) throw new Error(`No invitation link for ${email} in the outbox`);
  return link[1]!;
}

describe('Invitations', () => {
  let testApp: TestApp;
  let owner: SignedInUser;
  let teamId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    owner = await registerUser(testApp.app, 'owner');
    teamId = await createTeam(testApp.app, owner, 'Kestrel Test Pit');
  });

  afterAll(async () => {
    await testApp.close();
  });

  function invite(email: string, role = 'editor') {
    return request(testApp.app).post(`/api/teams/${teamId}/invitations`).set('Authorization', owner.auth).send({ email, role });
  }

  it('When an owner invites an address, then 201 answers and the fake SMTP server receives one e-mail with the link', async () => {
    const email = uniqueEmail('invitee');

    const response = await invite(email, 'reviewer');

    expect(response.status).toBe(201);
    expect(invitationSchema.parse(response.body)).toMatchObject({ email, role: 'reviewer' });
    const days = (Date.parse(response.body.expiresAt) - Date.parse(response.body.createdAt)) / 86_400_000;
    expect(days).toBeCloseTo(7, 5);
    const messages = testApp.smtp.messages().filter((message) => message.to === email);
    expect(messages).toHaveLength(1);
    expect(messages[0]!.subject).toBe('Invitation to join Kestrel Test Pit on Tallus');
    expect(messages[0]!.text).toContain('as reviewer');
    expect(messages[0]!.text).toMatch(/http:\/\/tallus\.test:4300\/invitations\/accept\?token=[\w-]{43}\b/);
  });

  it('When an invitation is stored, then the database holds a hash of the token, never the token', async () => {
    const email = uniqueEmail('hashed');
    await invite(email).expect(201);
    const token = tokenFromOutbox(testApp, email);

    const rows = await testApp.orm.em.fork().getConnection().execute('select * from invitations where email = ?', [email]);

    expect(rows).toHaveLength(1);
    expect(JSON.stringify(rows)).not.toContain(token);
    expect((rows[0] as { token_hash: string }).token_hash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('When the invited user accepts, then they join with the role; a second accept answers 409 INVITATION_USED', async () => {
    const invitee = await registerUser(testApp.app, 'joiner');
    await invite(invitee.email, 'editor').expect(201);
    const token = tokenFromOutbox(testApp, invitee.email);

    const first = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token });
    const second = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', invitee.auth);

    expect(first.status).toBe(200);
    expect(first.body).toEqual({ teamId, teamName: 'Kestrel Test Pit', role: 'editor' });
    expect(second.status).toBe(409);
    expect(second.body.code).toBe('INVITATION_USED');
    expect(me.body.memberships).toEqual([{ teamId, teamName: 'Kestrel Test Pit', role: 'editor' }]);
  });

  it('When the same invitation is accepted twice at the same moment, then exactly one accept succeeds', async () => {
    const invitee = await registerUser(testApp.app, 'racer');
    await invite(invitee.email).expect(201);
    const token = tokenFromOutbox(testApp, invitee.email);

    const responses = await Promise.all(
      [1, 2].map(() => request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token })),
    );

    expect(responses.map((response) => response.status).sort()).toEqual([200, 409]);
  });

  it('When the address is invited before it has an account, then registering with it and accepting works', async () => {
    const email = uniqueEmail('later');
    await invite(email, 'viewer').expect(201);
    const token = tokenFromOutbox(testApp, email);

    const registration = await request(testApp.app).post('/api/auth/register').send({ email, password: TEST_PASSWORD, displayName: 'Late Joiner' });
    const accept = await request(testApp.app).post('/api/invitations/accept').set('Authorization', `Bearer ${registration.body.token}`).send({ token });

    expect(accept.status).toBe(200);
    expect(accept.body.role).toBe('viewer');
  });

  it('When another signed-in user uses the link, then the answer is 403 INVITATION_WRONG_USER and the invitation stays usable', async () => {
    const invitee = await registerUser(testApp.app, 'rightful');
    const intruder = await registerUser(testApp.app, 'intruder');
    await invite(invitee.email).expect(201);
    const token = tokenFromOutbox(testApp, invitee.email);

    const wrong = await request(testApp.app).post('/api/invitations/accept').set('Authorization', intruder.auth).send({ token });
    const right = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token });

    expect(wrong.status).toBe(403);
    expect(wrong.body.code).toBe('INVITATION_WRONG_USER');
    expect(right.status).toBe(200);
  });

  it('When the invitation has expired, then accepting answers 410 INVITATION_EXPIRED and adds no member', async () => {
    const invitee = await registerUser(testApp.app, 'late');
    await invite(invitee.email).expect(201);
    const token = tokenFromOutbox(testApp, invitee.email);
    await testApp.orm.em.fork().getConnection().execute("update invitations set expires_at = now() - interval '1 minute' where email = ?", [invitee.email]);

    const response = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', invitee.auth);

    expect(response.status).toBe(410);
    expect(response.body.code).toBe('INVITATION_EXPIRED');
    expect(me.body.memberships).toEqual([]);
  });

  it('When the token is unknown, then accepting answers 404 INVITATION_NOT_FOUND', async () => {
    const user = await registerUser(testApp.app, 'guesser');

    const response = await request(testApp.app).post('/api/invitations/accept').set('Authorization', user.auth).send({ token: 'A'.repeat(43) });

    expect(response.status).toBe(404);
    expect(response.body.code).toBe('INVITATION_NOT_FOUND');
  });

  it('When accepting without signing in, then the answer is 401 AUTH_REQUIRED', async () => {
    const response = await request(testApp.app).post('/api/invitations/accept').send({ token: 'whatever' });

    expect(response.status).toBe(401);
    expect(response.body.code).toBe('AUTH_REQUIRED');
  });

  it('When the address already belongs to a member, then inviting it answers 409 INVITATION_ALREADY_MEMBER and sends nothing', async () => {
    const before = testApp.smtp.messages().length;

    const response = await invite(owner.email);

    expect(response.status).toBe(409);
    expect(response.body.code).toBe('INVITATION_ALREADY_MEMBER');
    expect(testApp.smtp.messages()).toHaveLength(before);
  });

  it('When an address is invited again, then only the newest link works and the list shows one pending invitation for it', async () => {
    const invitee = await registerUser(testApp.app, 'twice');
    await invite(invitee.email, 'viewer').expect(201);
    const oldToken = tokenFromOutbox(testApp, invitee.email);
    await invite(invitee.email, 'editor').expect(201);
    const newToken = tokenFromOutbox(testApp, invitee.email);

    const list = await request(testApp.app).get(`/api/teams/${teamId}/invitations`).set('Authorization', owner.auth);
    const oldAccept = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token: oldToken });
    const newAccept = await request(testApp.app).post('/api/invitations/accept').set('Authorization', invitee.auth).send({ token: newToken });

    expect(newToken).not.toBe(oldToken);
    expect(list.body.filter((invitation: { email: string }) => invitation.email === invitee.email)).toEqual([
      expect.objectContaining({ email: invitee.email, role: 'editor' }),
    ]);
    expect(oldAccept.status).toBe(404);
    expect(newAccept.body.role).toBe('editor');
  });

  it('When pending invitations are listed, then accepted and expired ones are left out, newest first', async () => {
    const owner2 = await registerUser(testApp.app, 'owner2');
    const team2 = await createTeam(testApp.app, owner2, 'Listing Team');
    const accepted = await registerUser(testApp.app, 'accepted');
    const emails = [accepted.email, uniqueEmail('expired'), uniqueEmail('pending-a'), uniqueEmail('pending-b')];
    for (const email of emails) {
      await request(testApp.app).post(`/api/teams/${team2}/invitations`).set('Authorization', owner2.auth).send({ email, role: 'viewer' }).expect(201);
    }
    await request(testApp.app).post('/api/invitations/accept').set('Authorization', accepted.auth).send({ token: tokenFromOutbox(testApp, accepted.email) }).expect(200);
    await testApp.orm.em.fork().getConnection().execute("update invitations set expires_at = now() - interval '1 second' where email = ?", [emails[1]]);

    const response = await request(testApp.app).get(`/api/teams/${team2}/invitations`).set('Authorization', owner2.auth);

    expect(response.status).toBe(200);
    expect(response.body.map((invitation: { email: string }) => invitation.email)).toEqual([emails[3], emails[2]]);
    expect(JSON.stringify(response.body)).not.toMatch(/token/i);
  });
});

describe('The development outbox', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When a signed-in user reads /api/dev/outbox in test mode, then it lists received messages newest first', async () => {
    const owner = await registerUser(testApp.app, 'outbox');
    const teamId = await createTeam(testApp.app, owner, 'Outbox Team');
    const [first, second] = [uniqueEmail('first'), uniqueEmail('second')];
    for (const email of [first, second]) {
      await request(testApp.app).post(`/api/teams/${teamId}/invitations`).set('Authorization', owner.auth).send({ email, role: 'viewer' }).expect(201);
    }

    const response = await request(testApp.app).get('/api/dev/outbox').set('Authorization', owner.auth);

    expect(response.status).toBe(200);
    const messages = outboxResponseSchema.parse(response.body);
    expect(messages.map((message) => message.to)).toEqual([second, first]);
    expect(messages[0]!.text).toContain('/invitations/accept?token=');
  });

  it('When the outbox is read without signing in, then the answer is 401', async () => {
    const response = await request(testApp.app).get('/api/dev/outbox');

    expect(response.status).toBe(401);
  });

  it('When the server runs in production mode, then /api/dev/outbox does not exist', async () => {
    const production = await startTestApp({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40), SMTP_HOST: '127.0.0.1' });
    const user = await registerUser(production.app, 'prod');

    const response = await request(production.app).get('/api/dev/outbox').set('Authorization', user.auth);
    await production.close();

    expect(response.status).toBe(404);
    expect(response.body.code).toBe('NOT_FOUND');
  });
});
