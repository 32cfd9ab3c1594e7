/**
 * The fit engine's public surface: pure computations with no framework or I/O.
 * Every module throws subclasses of EngineError on input it cannot accept.
 */
export * from './engine-error';

// ---- lengths, fits, splines, length window ----
export * from './units';
export * from './fits';
export * from './measured-fit';
export * from './splines';
export * from './length-window';

// ---- interfaces and the verified-fit checklist ----
export * from './checklist';
export * from './interface-evaluation';

// ---- transcripts and spoken measurements (appended by their module's author) ----
export * from './transcript-formats';
export * from './spoken-measurements';
export * from './number-words';
export * from './mark-suggestions';

// ---- guides ----
export * from './safety-topics';
export * from './guide-effort';

// ---- display ----
export * from './byte-sizes';
