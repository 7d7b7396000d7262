/** Set by vite.config.ts at build time; absent under the unit tests, which run the sources without Vite's define. */
declare const __GELPOINT_BUILD_ID__: string | undefined;
