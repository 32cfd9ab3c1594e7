/** Emitted after a transcript revision is stored and made active; marks mine it for suggestions. */
export const TRANSCRIPT_ATTACHED = 'transcript.attached';

export interface TranscriptAttachedEvent {
  workshopId: string;
  footageId: string;
  transcriptId: string;
}
