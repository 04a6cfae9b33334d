/**
 * Stands in for shared/i18n/localize.ts in the app's build (angular.json fileReplacements): in the
 * browser `$localize` comes from the polyfills, set before any module runs, and is replaced by
 * each language's words at build time.
 */
export {};
