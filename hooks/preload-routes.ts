/** Native: every screen is in the one bundle already (async routes are web-only), nothing to fetch. */
export function preloadRoutes(): void {}
