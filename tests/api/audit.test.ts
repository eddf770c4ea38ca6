// The audit page's data: filtered by person, kind, action and date on the server, paged with a total,
// exported as CSV, with failed sign-ins of members, and nothing of another organisation.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AUDIT_PAGE_MAX } from '../../shared/api/audit';
import { apiRoutes } from '../../shared/api/routes';
import { AuditEntryEntity } from '../../server/db/entities';
import { appFor } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });
const audit = (query: Record<string, string | number>) =>
  org.people.owner.agent.get(apiRoutes.audit(org.people.organisationId)).query(query);

describe('audit trail', () => {
  it('filters by person and kind, and pages with a total', async () => {
    const byEngineer = await audit({ actorId: org.people.engineer.id, pageSize: AUDIT_PAGE_MAX });
    expect(byEngineer.status).toBe(200);
    expect(byEngineer.body.entries.length).toBeGreaterThan(0);
    for (const entry of byEngineer.body.entries) expect(entry.actor?.id ?? entry.entityId).toBe(org.people.engineer.id);

    const runs = await audit({ entity: 'run' });
    expect(runs.body.entries.every((e: { entity: string }) => e.entity === 'run')).toBe(true);
    expect(runs.body.total).toBe(runs.body.entries.length);

    const all = await audit({ pageSize: AUDIT_PAGE_MAX });
    const first = await audit({ pageSize: 2, page: 1 });
    const second = await audit({ pageSize: 2, page: 2 });
    expect(first.body.total).toBe(all.body.total);
    expect([...first.body.entries, ...second.body.entries].map((e: { id: string }) => e.id)).toEqual(
      all.body.entries.slice(0, 4).map((e: { id: string }) => e.id),
    );
  });

  it('filters by date, a whole day when given as YYYY-MM-DD', async () => {
    const old = await db().getRepository(AuditEntryEntity).save({
      organisationId: org.people.organisationId,
      actorId: org.people.owner.id,
      action: 'update',
      entity: 'project',
      entityId: 'old-one',
      detail: {},
    });
    await db().query(`UPDATE audit_entries SET created_at = '2026-01-15T12:00:00Z' WHERE id = $1`, [old.id]);
    const day = await audit({ from: '2026-01-15', to: '2026-01-15' });
    expect(day.body.entries.map((e: { id: string }) => e.id)).toEqual([old.id]);
    expect((await audit({ from: '2026-01-16' })).body.entries.map((e: { id: string }) => e.id)).not.toContain(old.id);
    const backwards = await audit({ from: '2026-01-16', to: '2026-01-15' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['to']);
  });

  it(`takes pages of 1 to ${AUDIT_PAGE_MAX} entries and names a field outside`, async () => {
    expect((await audit({ pageSize: AUDIT_PAGE_MAX })).status).toBe(200);
    const wrong: Record<string, string | number>[] = [
      { pageSize: AUDIT_PAGE_MAX + 1 },
      { pageSize: 0 },
      { page: 0 },
      { entity: 'planet' },
      { actorId: 'me' },
      { from: 'yesterday' },
    ];
    for (const query of wrong) {
      const res = await audit(query);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(Object.keys(query));
    }
  });

  it("records failed sign-ins against a member's account, and shows them to the owner", async () => {
    await request(appFor(db()))
      .post(apiRoutes.signIn)
      .send({ email: org.people.viewer.email, password: 'a wrong guess here' });
    const failed = await audit({ action: 'sign-in-failed' });
    expect(failed.body.entries[0]).toMatchObject({
      action: 'sign-in-failed',
      actor: null,
      entity: 'user',
      entityId: org.people.viewer.id,
      detail: { email: org.people.viewer.email },
    });
    const byViewer = await audit({ actorId: org.people.viewer.id, action: 'sign-in-failed' });
    expect(byViewer.body.total).toBeGreaterThan(0);
  });

  it("never shows another organisation's rows, nor sign-ins of people outside it", async () => {
    await org.people.outsider.agent
      .post('/api/projects')
      .send({ name: 'Elsewhere', organisationId: org.people.outsider.organisationId });
    await request(appFor(db()))
      .post(apiRoutes.signIn)
      .send({ email: org.people.outsider.email, password: 'a wrong guess here' });
    const all = await audit({ pageSize: AUDIT_PAGE_MAX });
    const ids = new Set(
      all.body.entries.flatMap((e: { actor: { id: string } | null; entityId: string }) => [e.actor?.id, e.entityId]),
    );
    expect(ids.has(org.people.outsider.id)).toBe(false);
    expect(
      all.body.entries.every(
        (e: { organisationId: string | null }) =>
          e.organisationId === null || e.organisationId === org.people.organisationId,
      ),
    ).toBe(true);
  });

  it('exports the filtered rows as CSV, with formula-like text kept as text', async () => {
    await db()
      .getRepository(AuditEntryEntity)
      .save({
        organisationId: org.people.organisationId,
        actorId: org.people.owner.id,
        action: 'create',
        entity: 'project',
        entityId: '=HYPERLINK("x")',
        detail: { name: 'Line, "A"' },
      });
    const res = await org.people.owner.agent
      .get(apiRoutes.auditCsv(org.people.organisationId))
      .query({ entity: 'project' });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /attachment; filename="lanewright-audit-\d{4}-\d{2}-\d{2}\.csv"/,
    );
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toBe('time,person,email,action,kind,id,details');
    expect(lines.slice(1).every((line) => line.includes(',project,'))).toBe(true);
    expect(res.text).toContain(`"'=HYPERLINK(""x"")"`);
    expect(res.text).toContain('"{""name"":""Line, \\""A\\""""}"');
  });
});
