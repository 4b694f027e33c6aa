/** The sizes at which the editor handles a design differently. */

/**
 * Above this many parts a design opens with a choice (open anyway, read-only, report only)
 * instead of at once. Measured (bench:ui, 2-core machine, software rendering): a 2,000-part
 * design takes about 4 s from a reload to its chips and an edit on it stays near a frame; a
 * 5,000-part one froze the page for 6 s.
 */
export const LARGE_DESIGN_PARTS = 2000;

/** Files larger than this are read in the worker (about 450 parts; a 1,000-part file is 0.56 MB). */
export const WORKER_FILE_BYTES = 256 * 1024;
