/**
 * The engine's public interface: what the application, the worker, the command line and the seed use.
 * Code outside lib/engine imports from here only (a lint rule holds it); the modules behind it are the
 * engine's own and may change shape.
 */
export { ENGINE_VERSION, HORIZONS, SOURCES, assessInputSchema, runAssessment, profileHash } from './assess';
export type { AssessInput, AssessParsed, AssessOptions, AssessOutput, AssessProgress, AssessStats, ScenarioWorkerPool } from './assess';
export { HistoryCache } from './assess-cache';
export {
  siteSchema,
  exampleSite,
  givenColumnDepthM,
  ICE_CLASSES,
  SNOW_CASES,
  CHECKLIST_ITEMS,
  CHECKLIST_ANSWERS,
  TEXTURES,
  SURFACE_COVERS,
  MIN_COLUMN_DEPTH_M,
  DEFAULT_BOTTOM_HEAT_FLUX_W_M2,
} from './site-schema';
export type { SiteInput, Site, SiteLayer, IceClass, SnowCase, ChecklistItem, Texture, SurfaceCover } from './site-schema';
export { SCENARIOS, SCENARIO_EMISSIONS_WORDS, scenarioSchema } from './scenario-forcing';
export type { ScenarioId } from './scenario-forcing';
export { SETTLEMENT_HIGH_M, SETTLEMENT_MODERATE_M, VERY_WARM_PERMAFROST_C, WARM_PERMAFROST_C } from './constants';
export { canonicalSha256 } from './canonical-hash';
export { EngineInputError, findNonFinite, formatIssues, formatIssuePath } from './validation';
