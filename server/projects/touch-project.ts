// A project's "updated" time follows the work inside it: new scenarios, revisions and runs, renames
// and deletions all move it, so the project list puts active projects first. Call it last in a
// transaction: every writer then locks its scenario row (a revision's FOR UPDATE, a run's foreign-key
// check) before the project row, and concurrent saves of runs and revisions cannot deadlock.
import type { EntityManager } from 'typeorm';
import { ProjectEntity } from '../db/entities';

export async function touchProject(manager: EntityManager, projectId: string): Promise<void> {
  await manager
    .createQueryBuilder()
    .update(ProjectEntity)
    .set({ updatedAt: () => 'now()' })
    .where('id = :id', { id: projectId })
    .execute();
}
