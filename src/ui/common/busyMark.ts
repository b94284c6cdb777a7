/** A re-ranking is marked on screen (table dimmed, progress bar) once it has run this long. */
export const BUSY_MARK_DELAY_MS = 200;
