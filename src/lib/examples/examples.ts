// The example layouts shipped with Lanewright, bundled at build time. Only
// examples that pass the scenario schema are offered, so a new user never
// starts from a document the server would refuse.
import { scenarioSchema, type Scenario } from '../../../shared/scenario/scenario';

export interface ExampleScenario {
  /** The file name without extension, stable across releases. */
  id: string;
  document: Scenario;
}

const files = import.meta.glob<unknown>('../../../shared/examples/*.json', { eager: true, import: 'default' });

function exampleId(path: string): string {
  return path.slice(path.lastIndexOf('/') + 1).replace(/\.json$/, '');
}

export const exampleScenarios: readonly ExampleScenario[] = Object.entries(files)
  .flatMap(([path, json]) => {
    const parsed = scenarioSchema.safeParse(json);
    return parsed.success ? [{ id: exampleId(path), document: parsed.data }] : [];
  })
  .sort((a, b) => a.document.name.localeCompare(b.document.name));
