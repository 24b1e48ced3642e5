// Stands in for zod's `locales` barrel (all ~50 languages, 273 KB): the app speaks English only, and
// zod itself configures `en` directly. `z.locales.en` still works; other languages are not bundled.
export { default as en } from '../node_modules/zod/v4/locales/en.js';
