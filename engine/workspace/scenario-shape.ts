// Compatibility re-export: the workspace once carried its own copy of the scenario types. They now
// live in engine/scenario/types.ts; import them from there.

export type { LaneKey, NewLane, Scenario, ScenarioChange } from '../scenario/types';
