// Projects as the API shows them (shared/api/projects.ts).
import type { Project } from '../../shared/api/projects';
import type { ProjectEntity } from '../db/entities';
import { iso, toUserRef } from './common';

export function toProject(project: ProjectEntity, scenarioCount: number): Project {
  return {
    id: project.id,
    organisationId: project.organisationId,
    name: project.name,
    description: project.description,
    scenarioCount,
    createdBy: toUserRef(project.createdBy),
    createdAt: iso(project.createdAt),
    updatedAt: iso(project.updatedAt),
  };
}
