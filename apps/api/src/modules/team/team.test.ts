import { describe, expect, it } from 'vitest';
import { PASSWORD, bearer, createShop, linkTokenFor, uniqueEmail, useHarness } from '../../test-support/harness';

const h = useHarness();

describe('invitations', () => {
  it('mails a one-time link that creates the account with the chosen role', async () => {
    const shop = await createShop(h, 'Invite shop');
    const email = uniqueEmail('new');
    const inv = await h.http().post('/api/shop/invitations').set(bearer(shop.lead)).send({ email, role: 'apprentice' }).expect(201);
    expect(inv.body).toMatchObject({ email, role: 'apprentice', status: 'pending', invitedBy: { name: 'Lead Person' } });
    const mail = await h.ds.query(`SELECT subject, body_text, status, dedupe_key FROM outbound_mail WHERE to_address = $1`, [email]);
    expect(mail).toHaveLength(1);
    expect(mail[0]).toMatchObject({ status: 'pending', dedupe_key: `invitation:${inv.body.id}` });
    expect(mail[0].subject).toContain('Invite shop');
    const token = await linkTokenFor(h.ds, email, 'invitations');
    expect(mail[0].body_text).toContain(`http://127.0.0.1:8080/invitations/${token}`);

    const preview = await h.http().get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ shopName: 'Invite shop', email, role: 'apprentice', accountExists: false });
    await h.http().post(`/api/invitations/${token}/accept`).send({ password: PASSWORD }).expect(400);
    const accepted = await h.http().post(`/api/invitations/${token}/accept`).send({ name: 'Nia', password: PASSWORD }).expect(200);
    expect(accepted.body).toMatchObject({ role: 'apprentice', shop: { id: shop.shopId }, user: { email, name: 'Nia' } });
    const reuse = await h.http().post(`/api/invitations/${token}/accept`).send({ name: 'Nia', password: PASSWORD }).expect(410);
    expect(reuse.body.error.code).toBe('invitation_used');
    const list = await h.http().get('/api/shop/invitations').set(bearer(shop.lead)).expect(200);
    expect(list.body.find((i: { id: string }) => i.id === inv.body.id).status).toBe('accepted');
  });

  it('refuses expired, revoked, replaced and made-up links', async () => {
    const shop = await createShop(h);
    const email = uniqueEmail('late');
    await h.http().post('/api/shop/invitations').set(bearer(shop.lead)).send({ email, role: 'maker' }).expect(201);
    const first = await linkTokenFor(h.ds, email, 'invitations');
    const second = await h.http().post('/api/shop/invitations').set(bearer(shop.lead)).send({ email, role: 'maker' }).expect(201);
    expect((await h.http().get(`/api/invitations/${first}`).expect(410)).body.error.code).toBe('invitation_revoked');
    const latest = await linkTokenFor(h.ds, email, 'invitations');
    await h.ds.query(`UPDATE invitations SET expires_at = now() - interval '1 second' WHERE id = $1`, [second.body.id]);
    expect((await h.http().get(`/api/invitations/${latest}`).expect(410)).body.error.code).toBe('invitation_expired');
    expect(
      (
        await h
          .http()
          .get(`/api/invitations/${'x'.repeat(43)}`)
          .expect(404)
      ).body.error.code,
    ).toBe('invitation_not_found');
    await h.http().get('/api/invitations/short').expect(400);

    const third = await h.http().post('/api/shop/invitations').set(bearer(shop.lead)).send({ email, role: 'maker' }).expect(201);
    await h.http().delete(`/api/shop/invitations/${third.body.id}`).set(bearer(shop.lead)).expect(204);
    const t3 = await linkTokenFor(h.ds, email, 'invitations');
    expect((await h.http().post(`/api/invitations/${t3}/accept`).send({ name: 'X', password: PASSWORD }).expect(410)).body.error.code).toBe(
      'invitation_revoked',
    );
  });

  it('does not invite someone who is already a member', async () => {
    const shop = await createShop(h);
    const maker = await shop.member('maker');
    const res = await h.http().post('/api/shop/invitations').set(bearer(shop.lead)).send({ email: maker.user.email, role: 'lead' }).expect(409);
    expect(res.body.error.code).toBe('already_member');
  });
});

describe('members', () => {
  it('changes roles, and disabling a member ends their sessions at once', async () => {
    const shop = await createShop(h);
    const maker = await shop.member('maker');
    const members = (await h.http().get('/api/shop/members').set(bearer(shop.lead)).expect(200)).body as { id: string; userId: string; role: string }[];
    const m = members.find((x) => x.userId === maker.user.id)!;
    expect(m.role).toBe('maker');
    const changed = await h.http().patch(`/api/shop/members/${m.id}`).set(bearer(shop.lead)).send({ role: 'apprentice' }).expect(200);
    expect(changed.body.role).toBe('apprentice');
    expect((await h.http().get('/api/me').set(bearer(maker)).expect(200)).body.role).toBe('apprentice');
    await h.http().patch(`/api/shop/members/${m.id}`).set(bearer(shop.lead)).send({ status: 'disabled' }).expect(200);
    await h.http().get('/api/me').set(bearer(maker)).expect(401);
    const login = await h.http().post('/api/auth/login').send({ email: maker.user.email, password: PASSWORD }).expect(403);
    expect(login.body.error.code).toBe('no_active_shop');
    const audit = await h.http().get('/api/audit').set(bearer(shop.lead)).query({ objectType: 'membership' }).expect(200);
    expect(audit.body.items.map((e: { action: string }) => e.action)).toEqual(['member.update', 'member.update']);
  });

  it('keeps at least one active lead', async () => {
    const shop = await createShop(h);
    const members = (await h.http().get('/api/shop/members').set(bearer(shop.lead)).expect(200)).body as { id: string }[];
    const res = await h.http().patch(`/api/shop/members/${members[0]!.id}`).set(bearer(shop.lead)).send({ role: 'maker' }).expect(409);
    expect(res.body.error.code).toBe('last_lead');
    const colead = await shop.member('lead');
    await h.http().patch(`/api/shop/members/${members[0]!.id}`).set(bearer(colead)).send({ role: 'maker' }).expect(200);
    await h.http().patch(`/api/shop/members/${members[0]!.id}`).set(bearer(shop.lead)).send({ role: 'lead' }).expect(403);
  });

  it('refuses an empty change', async () => {
    const shop = await createShop(h);
    const members = (await h.http().get('/api/shop/members').set(bearer(shop.lead)).expect(200)).body as { id: string }[];
    const res = await h.http().patch(`/api/shop/members/${members[0]!.id}`).set(bearer(shop.lead)).send({}).expect(400);
    expect(res.body.error.message).toMatch(/role or a status/);
  });
});
