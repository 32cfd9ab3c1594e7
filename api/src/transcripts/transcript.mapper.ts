import { CueDto, TranscriptDto, TranscriptRevisionDto } from './dto/transcript.dto';
import { TranscriptCue } from './entities/transcript-cue.entity';
import { Transcript } from './entities/transcript.entity';

export function toTranscriptRevision(transcript: Transcript): TranscriptRevisionDto {
  return {
    id: transcript.id,
    footageId: transcript.footageId,
    revision: transcript.revision,
    format: transcript.format,
    sourceName: transcript.sourceName,
    cueCount: transcript.cueCount,
    isActive: transcript.isActive,
    createdAt: transcript.createdAt.toISOString(),
  };
}

export function toCue(cue: TranscriptCue): CueDto {
  return { index: cue.cueIndex, startMs: cue.startMs, endMs: cue.endMs, text: cue.text };
}

export function toTranscript(transcript: Transcript, cues: TranscriptCue[]): TranscriptDto {
  return { ...toTranscriptRevision(transcript), cues: cues.map(toCue) };
}
