import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousSession, demoUser, signIn, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface StaffMember {
  id: string;
  email: string;
  name: string;
  role: string;
  active: boolean;
  createdAt: string;
}

describe('staff accounts (HTTP, manager only)', () => {
  let testApp: TestApp;
  let manager: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
  });

  afterAll(async () => {
    await testApp.close();
  });

  async function createStaff(
    role: 'desk' | 'tech' | 'manager',
  ): Promise<StaffMember & { password: string }> {
    const email = `staff-${role}-${Date.now()}-${Math.round(Math.random() * 1e6)}@example.test`;
    const password = 'a-staff-password';
    const response = await manager.agent
      .post('/api/staff')
      .set('x-csrf-token', manager.csrfToken)
      .send({ email, name: `New ${role}`, role, password })
      .expect(201);
    return { ...(response.body as StaffMember), password };
  }

  it('lists every account that is not a customer', async () => {
    const response = await manager.agent.get('/api/staff').expect(200);
    const items = (response.body as { items: StaffMember[] }).items;
    const emails = items.map((item) => item.email);
    expect(emails).toEqual(
      expect.arrayContaining([
        demoUser('manager').email,
        demoUser('desk').email,
        demoUser('tech').email,
      ]),
    );
    expect(emails).not.toContain(demoUser('customer').email);
    expect(items.every((item) => item.role !== 'customer')).toBe(true);
    expect(Object.keys(items[0]).sort()).toEqual([
      'active',
      'createdAt',
      'email',
      'id',
      'name',
      'role',
    ]);
  });

  it('creates a staff member who can sign in with the role given', async () => {
    const member = await createStaff('tech');
    expect(member).toMatchObject({ role: 'tech', active: true, name: 'New tech' });
    expect(new Date(member.createdAt).toString()).not.toBe('Invalid Date');
    const session = await signIn(testApp, member.email, member.password);
    const me = await session.agent.get('/api/auth/me').expect(200);
    expect(me.body.user.role).toBe('tech');
  });

  it('refuses an e-mail address that is already used (409, fieldErrors.email)', async () => {
    const response = await manager.agent
      .post('/api/staff')
      .set('x-csrf-token', manager.csrfToken)
      .send({
        email: demoUser('customer').email,
        name: 'Copy',
        role: 'desk',
        password: 'a-staff-password',
      })
      .expect(409);
    expect(response.body.fieldErrors.email).toHaveLength(1);
  });

  it('refuses the customer role and unknown fields', async () => {
    const response = await manager.agent
      .post('/api/staff')
      .set('x-csrf-token', manager.csrfToken)
      .send({
        email: 'x@example.test',
        name: 'X',
        role: 'customer',
        password: 'a-staff-password',
        salary: 1,
      })
      .expect(400);
    expect(response.body.fieldErrors).toEqual({
      role: ['must be one of desk, tech, manager'],
      salary: ['is not an expected field'],
    });
  });

  it('renames, changes the role of and switches off a staff member', async () => {
    const member = await createStaff('desk');
    const session = await signIn(testApp, member.email, member.password);

    const renamed = await manager.agent
      .patch(`/api/staff/${member.id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ name: 'Renamed Person', role: 'tech' })
      .expect(200);
    expect(renamed.body).toMatchObject({
      id: member.id,
      name: 'Renamed Person',
      role: 'tech',
      active: true,
    });

    const switchedOff = await manager.agent
      .patch(`/api/staff/${member.id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ active: false })
      .expect(200);
    expect(switchedOff.body.active).toBe(false);

    // The open session ends and signing in again is refused with the usual message.
    await session.agent.get('/api/auth/me').expect(401);
    const visitor = await anonymousSession(testApp);
    const again = await visitor.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', visitor.csrfToken)
      .send({ email: member.email, password: member.password })
      .expect(401);
    expect(again.body.message).toBe('E-mail or password is not right');
  });

  it('does not let a manager deactivate or demote themselves (400)', async () => {
    const me = (await manager.agent.get('/api/auth/me').expect(200)).body.user as { id: string };
    const deactivate = await manager.agent
      .patch(`/api/staff/${me.id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ active: false })
      .expect(400);
    expect(deactivate.body.fieldErrors).toHaveProperty('active');
    const demote = await manager.agent
      .patch(`/api/staff/${me.id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ role: 'desk' })
      .expect(400);
    expect(demote.body.fieldErrors).toHaveProperty('role');
    const after = await manager.agent.get('/api/auth/me').expect(200);
    expect(after.body.user.role).toBe('manager');
    // Renaming yourself is fine.
    await manager.agent
      .patch(`/api/staff/${me.id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ name: demoUser('manager').name })
      .expect(200);
  });

  it('answers 404 for a customer or unknown id and 400 for a malformed id', async () => {
    const customer = await signInAs(testApp, 'customer');
    const customerId = ((await customer.agent.get('/api/auth/me')).body.user as { id: string }).id;
    await manager.agent
      .patch(`/api/staff/${customerId}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ name: 'Nope' })
      .expect(404);
    const malformed = await manager.agent
      .patch('/api/staff/not-a-uuid')
      .set('x-csrf-token', manager.csrfToken)
      .send({ name: 'Nope' })
      .expect(400);
    expect(malformed.body.fieldErrors).toEqual({ id: ['must be a UUID'] });
  });
});
