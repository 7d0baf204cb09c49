// Stands in for zod's locales index in the web bundle (see metro.config.js): English only, the one locale the app
// uses (zod's default). The full index bundles about 60 languages, some 270 KB of script before compression.
export { default as en } from 'zod/v4/locales/en.js';
