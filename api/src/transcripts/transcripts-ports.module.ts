import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { TranscriptSummaries } from '../footage/transcript-summaries.port';
import { Transcript } from './entities/transcript.entity';
import { TranscriptSummaryReader } from './transcript-summary-reader';

/**
 * The ports other domains declare and transcripts fill. Global, so footage (which transcripts import) can
 * inject its port without importing transcripts back.
 */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([Transcript])],
  providers: [TranscriptSummaryReader, { provide: TranscriptSummaries, useExisting: TranscriptSummaryReader }],
  exports: [TranscriptSummaries],
})
export class TranscriptsPortsModule {}
