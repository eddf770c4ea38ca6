// The engine's public face, the same in a Web Worker, in Node (CLI, server, bench) and in tests:
// check a scenario, run an experiment, recognise why a run stopped.
export {
  validateScenario,
  trackCapacity,
  gridlockFreeCarriers,
  type ValidationIssue,
  type ValidationOutcome,
} from './validate';
export {
  runExperiment,
  runReplicationRange,
  combineBlocks,
  InvalidInputError,
  type ReplicationBlock,
  type ReplicationRange,
  RESULT_POSITION_BINS,
  RESULT_TIME_BINS,
  type Progress,
  type RunHooks,
} from './experiment';
export { SimulationStoppedError, isSimulationStopped, type GridlockEntry, type StopReason } from './kernel/stop';
export { ENGINE_VERSION } from './version';
export {
  toSummaryJson,
  fromSummaryJson,
  blockToJson,
  blockFromJson,
  type ReplicationBlockJson,
} from './observe/summary-json';
export { recordPlayback } from './record-playback';
export { TraceLimitError } from './observe/trace';
