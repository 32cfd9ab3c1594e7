import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, IsString, Length, Matches, Max, MaxLength, Min } from 'class-validator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import { FIT_CHECK_STATES, type FitCheckState } from '../../engine/checklist';
import { MAX_SEARCH_TEXT } from '../search-query';

/** Public kinds come from published guides; the others are a member's own workshop records. */
export const SEARCH_KINDS = ['guide', 'part', 'cue', 'build', 'footage', 'mark', 'fit_check', 'draft_guide'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

/** `published`: what everyone may read; `unpublished`: a member's own workshop records (drafts, footage, checks…). */
export const SEARCH_STATES = ['published', 'unpublished'] as const;
export type SearchState = (typeof SEARCH_STATES)[number];

/** Fit-check states a search can narrow to (a retired check is history, not evidence). */
export const SEARCH_CHECK_STATES = FIT_CHECK_STATES.filter((state) => state !== 'retired') as Exclude<FitCheckState, 'retired'>[];
export type SearchCheckState = (typeof SEARCH_CHECK_STATES)[number];

/** Per-kind counts stop here: past it the answer says "1,000+" (`capped`), so no search reads every match to count it. */
export const MAX_SEARCH_COUNT = 1_000;

/** Deep pages cost every kind `offset + limit` rows; past the first thousand hits a narrower search serves better. */
export const MAX_SEARCH_OFFSET = 1_000;
export const MAX_SEARCH_LIMIT = 50;

export class SearchQueryDto {
  @ApiProperty({ example: 'pilot bearing', description: 'Words to find (each must appear; three letters or more) or a part number (exact or prefix, hyphens ignored)' })
  @IsString()
  @Length(1, MAX_SEARCH_TEXT)
  q!: string;

  @ApiPropertyOptional({ enum: SEARCH_KINDS, description: 'Only this kind of hit' })
  @IsOptional()
  @IsIn(SEARCH_KINDS)
  kind?: SearchKind;

  @ApiPropertyOptional({ description: "A workshop's slug: only its hits", example: 'harrow-lane-garage' })
  @IsOptional()
  @IsString()
  @Matches(/^[a-z0-9-]{1,60}$/u, { message: 'workshop must be a workshop slug (lower-case letters, digits and hyphens)' })
  workshop?: string;

  @ApiPropertyOptional({ enum: SEARCH_STATES, description: 'published: public hits only; unpublished: your own workshop records only' })
  @IsOptional()
  @IsIn(SEARCH_STATES)
  state?: SearchState;

  @ApiPropertyOptional({
    enum: SEARCH_CHECK_STATES,
    description:
      "Only hits with a fit check in this state: published guides whose assembly has such a check, and (members) their fit checks in it. Kinds that carry no check (builds, footage, marks, drafts, a member's own parts and cues) give no hits under it",
  })
  @IsOptional()
  @IsIn(SEARCH_CHECK_STATES)
  checkState?: SearchCheckState;

  @ApiPropertyOptional({ description: "Words the build's vehicle must contain", example: 'pickup' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  vehicle?: string;

  @ApiPropertyOptional({ default: 0, minimum: 0, maximum: MAX_SEARCH_OFFSET })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(MAX_SEARCH_OFFSET)
  offset?: number;

  @ApiPropertyOptional({ default: 20, minimum: 1, maximum: MAX_SEARCH_LIMIT })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(MAX_SEARCH_LIMIT)
  limit?: number;
}

export class SnippetSegmentDto {
  @ApiProperty({ description: 'Plain text: draw it as text, never as HTML' }) text!: string;
  @ApiProperty({ description: 'True for a word the search matched (draw it highlighted)' }) match!: boolean;
}

export class SearchWorkshopDto {
  @ApiProperty() name!: string;
  @ApiProperty() slug!: string;
}

export class SearchHitDto {
  @ApiProperty({ enum: SEARCH_KINDS }) kind!: SearchKind;
  @ApiProperty({ description: 'Stable within its kind' }) id!: string;
  @ApiProperty({ description: 'True when the hit comes from a published guide; false for your own workshop records' }) published!: boolean;
  @ApiProperty({ description: 'What the hit belongs to: the guide, the part, the build…' }) title!: string;
  @ApiProperty({ type: [SnippetSegmentDto], description: 'Words around the match, matched words flagged' }) snippet!: SnippetSegmentDto[];
  @ApiProperty({ type: SearchWorkshopDto }) workshop!: SearchWorkshopDto;
  @ApiProperty({ type: String, nullable: true, description: "The build's vehicle, when the hit belongs to a build" }) vehicle!: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Footage time of a cue or a mark, in milliseconds' }) startMs!: number | null;
  @ApiProperty({ type: String, nullable: true, description: "A fit check's state" }) checkState!: string | null;
  @ApiProperty({ description: 'Studio path that opens the hit; a cue opens the video at startMs (?t= seconds)', example: '/guides/harrow-lane-garage/motor-coupler?t=42.0' })
  link!: string;
}

export class SearchKindCountDto {
  @ApiProperty({ enum: SEARCH_KINDS }) kind!: SearchKind;
  @ApiProperty({ description: `Hits of this kind, at most ${MAX_SEARCH_COUNT}; with capped, a lower bound` }) count!: number;
  @ApiProperty({ description: 'True when there may be more than count (show "1,000+"): the count stopped at its cap or at the best-ranked matches read' })
  capped!: boolean;
}

export class SearchResultsDto {
  @ApiProperty({ description: 'The words searched for' }) terms!: string[];
  @ApiProperty({ description: 'Part-number keys matched exactly or by prefix (letters and digits, upper case)' }) partNumbers!: string[];
  @ApiProperty({ description: 'Hits of the asked kind (or of every kind) in all; results holds at most `limit`' }) total!: number;
  @ApiProperty({ description: 'True when total is a lower bound (a count it adds up is capped): show it as "1,000+"' }) totalCapped!: boolean;
  @ApiProperty() offset!: number;
  @ApiProperty() limit!: number;
  @ApiProperty({ type: [SearchKindCountDto], description: 'Hits per kind under the other filters, for the kind chips' }) counts!: SearchKindCountDto[];
  @ApiProperty({ type: [SearchHitDto], description: 'Best first' }) results!: SearchHitDto[];
}
