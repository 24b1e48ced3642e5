/** Named staleness for queries: no bare numbers elsewhere. */
export const STALE = {
  /** Who is signed in: changes only when an admin edits them. */
  session: 5 * 60_000,
  /** Catalog data changes only through imports. */
  catalog: 10 * 60_000,
  /** Lists an admin edits from this very screen. */
  adminLists: 30_000,
  /** Jobs and records: shared between techs in the field. */
  jobs: 15_000,
  /** Priced options on a job: an estimator and the office edit them; prices behind them change by import. */
  options: 15_000,
  /** Shop rule settings: an admin changes them rarely; checks offline use the kept copy. */
  ruleSettings: 10 * 60_000,
  /** Shop pricing and estimate settings: an admin changes them rarely, from Admin → Pricing. */
  shopSettings: 5 * 60_000,
} as const;

/** How long the offline cache keeps catalog items a tech viewed (ms). */
export const OFFLINE_CACHE_MAX_AGE = 7 * 24 * 60 * 60_000;
