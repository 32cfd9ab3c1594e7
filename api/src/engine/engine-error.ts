/**
 * Base class for every error the fit engine throws on input it cannot accept.
 * The API maps it to a 4xx response: `code` is a stable machine-readable tag,
 * `line` (when set) names the first bad line of a multi-line input such as a transcript.
 */
export class EngineError extends Error {
  constructor(
    message: string,
    readonly code: string,
    readonly line?: number,
  ) {
    super(message);
    // Subclasses report their own name in logs and stack traces.
    this.name = new.target.name;
  }
}
