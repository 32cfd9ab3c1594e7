import { ApiProperty } from '@nestjs/swagger';

/** At most this many measurements come back from one call; `total` says how many the text held. */
export const MAX_MEASUREMENTS_RETURNED = 1_000;

/** At most this many cues come back from one parse (about three hours of two-second cues). */
export const MAX_CUES_RETURNED = 5_000;

export class SpokenMeasurementDto {
  @ApiProperty({ example: 'fifteen thousandths of an inch', description: 'text.slice(start, end)' })
  phrase!: string;

  @ApiProperty({ example: 20, description: 'Character offset of the first character' })
  start!: number;

  @ApiProperty({ example: 50, description: 'Character offset just past the last character' })
  end!: number;

  @ApiProperty({ example: 0.015, description: 'The amount in `unit` (thou, mil and tenths are reported in inches)' })
  value!: number;

  @ApiProperty({ enum: ['mm', 'um', 'in'] })
  unit!: 'mm' | 'um' | 'in';

  @ApiProperty({ example: 0.381, description: 'The same length in millimetres (1 in = 25.4 mm exactly)' })
  millimetres!: number;
}

export class ExtractedMeasurementsDto {
  @ApiProperty({ type: [SpokenMeasurementDto], description: `In text order; at most ${MAX_MEASUREMENTS_RETURNED}` })
  measurements!: SpokenMeasurementDto[];

  @ApiProperty({ example: 1, description: 'How many measurements the text holds' })
  total!: number;

  @ApiProperty({ example: false, description: 'True when `measurements` stops short of `total`' })
  truncated!: boolean;
}

export class ParsedCueDto {
  @ApiProperty({ example: 1000 }) startMs!: number;
  @ApiProperty({ example: 4000 }) endMs!: number;
  @ApiProperty({ example: 'Hello' }) text!: string;
}

export class ParsedTranscriptDto {
  @ApiProperty({ enum: ['webvtt', 'srt', 'timestamped'] })
  format!: 'webvtt' | 'srt' | 'timestamped';

  @ApiProperty({ type: [ParsedCueDto], description: `In file order; at most ${MAX_CUES_RETURNED}` })
  cues!: ParsedCueDto[];

  @ApiProperty({ example: 1, description: 'How many cues the transcript holds' })
  total!: number;

  @ApiProperty({ example: false, description: 'True when `cues` stops short of `total`' })
  truncated!: boolean;
}
