// A project's "updated" time follows the work inside it: new scenarios, revisions and runs, renames
// and deletions all move it, so the project list puts active projects first.
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
