// lucia's storage contract implemented over the TypeORM data layer (sessions and users tables).
import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import { LessThanOrEqual, type DataSource } from 'typeorm';
import { SessionEntity } from '../db/entities';

function toDatabaseSession(row: SessionEntity): DatabaseSession {
  return { id: row.id, userId: row.userId, expiresAt: row.expiresAt, attributes: {} };
}

export function createSessionAdapter(ds: DataSource): Adapter {
  const sessions = () => ds.getRepository(SessionEntity);
  return {
    async getSessionAndUser(sessionId): Promise<[DatabaseSession | null, DatabaseUser | null]> {
      const row = await sessions().findOne({ where: { id: sessionId }, relations: { user: true } });
      if (!row?.user) return [null, null];
      return [toDatabaseSession(row), { id: row.user.id, attributes: { email: row.user.email, name: row.user.name } }];
    },
    async getUserSessions(userId) {
      const rows = await sessions().find({ where: { userId } });
      return rows.map(toDatabaseSession);
    },
    async setSession(session) {
      await sessions().insert({ id: session.id, userId: session.userId, expiresAt: session.expiresAt });
    },
    async updateSessionExpiration(sessionId, expiresAt) {
      await sessions().update({ id: sessionId }, { expiresAt });
    },
    async deleteSession(sessionId) {
      await sessions().delete({ id: sessionId });
    },
    async deleteUserSessions(userId) {
      await sessions().delete({ userId });
    },
    async deleteExpiredSessions() {
      await sessions().delete({ expiresAt: LessThanOrEqual(new Date()) });
    },
  };
}
