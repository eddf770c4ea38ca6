// Which organisations own a set of runs. A comparison is stored (and so shareable) only when the caller
// may see every run and all of them belong to one organisation.
import { In, type DataSource } from 'typeorm';
import { RunEntity } from '../db/entities';

/** Each run's owning organisation, in the order asked; null for a run that does not exist. */
export async function organisationsOfRuns(ds: DataSource, runIds: readonly string[]): Promise<(string | null)[]> {
  const runs = await ds
    .getRepository(RunEntity)
    .find({ where: { id: In([...runIds]) }, relations: { scenario: { project: true } } });
  const owners = new Map(runs.map((run) => [run.id, run.scenario?.project?.organisationId ?? null]));
  return runIds.map((id) => owners.get(id) ?? null);
}
