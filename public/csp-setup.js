// Runs before the page's modules (a plain script; index.html loads it first). The page's
// Content-Security-Policy forbids eval: tell zod (which probes for eval with `new Function` when its
// first schema is built, at module load) to run without generated code, so no probe is made and no
// policy violation is reported.
globalThis.__zod_globalConfig = Object.assign(globalThis.__zod_globalConfig || {}, { jitless: true });
