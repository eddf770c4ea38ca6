// The projects of an organisation as a list of cards linking to each project.
import { Link } from 'react-router-dom';
import type { Project } from '../../../../shared/api/projects';
import { formatCount, formatDateTime } from '../../../lib/format';

export function ProjectList({ projects }: { projects: Project[] }) {
  return (
    <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" aria-label="Projects">
      {projects.map((project) => (
        <li key={project.id}>
          <Link
            to={`/projects/${project.id}`}
            className="flex h-full flex-col gap-2 rounded-lg border border-paper-sunk bg-paper-raised p-5 shadow-sm transition hover:border-accent focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-accent"
          >
            <span className="text-lg font-semibold text-ink">{project.name}</span>
            {project.description && <span className="line-clamp-3 text-sm text-ink-soft">{project.description}</span>}
            <span className="mt-auto pt-2 text-sm text-ink-soft">
              {formatCount(project.scenarioCount, 'scenario')} · updated {formatDateTime(project.updatedAt)}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
