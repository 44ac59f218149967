/**
 * The tool's version, from package.json, put in at build time by vite's `define` (vite.config.ts; the
 * tests read the same config). Exports carry it in their captions and metadata.
 */
declare const __COVERSWEEP_VERSION__: string | undefined;

export const TOOL_VERSION: string =
  typeof __COVERSWEEP_VERSION__ === 'string' ? __COVERSWEEP_VERSION__ : 'unknown version';

/** The tool and its version, as captions and file headers name it. */
export const TOOL_LABEL = `CoverSweep ${TOOL_VERSION}`;
