// The scenario document: one line layout, its carriers, process and calendar. This schema is the only
// definition of the format: the editor, the API, the file import and the engine all parse with it,
// and scenarioJsonSchema() publishes it for other tools.
import { z } from 'zod';
import { checkReferences } from './references';
import { scenarioShapeSchema } from './scenario-shape';

export { SCENARIO_SCHEMA_VERSION } from './scenario-shape';

export const scenarioSchema = scenarioShapeSchema.superRefine(checkReferences);

export type Scenario = z.infer<typeof scenarioSchema>;
/** The document as written in a file, before defaults are filled in. */
export type ScenarioInput = z.input<typeof scenarioSchema>;

/** The published JSON Schema (draft 2020-12) of a scenario file, as accepted on input. */
export function scenarioJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(scenarioShapeSchema, { io: 'input', unrepresentable: 'any' }) as Record<
    string,
    unknown
  >;
  return {
    ...schema,
    title: 'Lanewright scenario',
    description:
      'A line of independently driven carriers: decks, lanes, transfers, carriers, process steps, stations and calendar. Lengths in mm, times in s.',
  };
}
