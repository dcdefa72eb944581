/** What every bench suite returns; bench/run.ts adds `suite`, `at` and `machine`. */
export interface SuiteResult {
  figures: Record<string, unknown>;
  ratios: Record<string, number>;
}

/** A suite lives in `bench/<name>/index.ts` and exports `run()`. */
export interface SuiteModule {
  run: () => Promise<SuiteResult>;
}
