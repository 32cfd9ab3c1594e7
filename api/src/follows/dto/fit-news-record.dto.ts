import { ApiProperty } from '@nestjs/swagger';

/** How one change of a check reached its followers. */
export class ChangeDeliveryRecordDto {
  @ApiProperty({ description: 'The history entry of the change' }) changeId!: string;
  @ApiProperty({ enum: ['confirmed', 'no_fit'] }) to!: string;
  @ApiProperty() changedAt!: string;
  @ApiProperty({ description: 'Followers whose mail server accepted the mail' }) told!: number;
  @ApiProperty({ description: 'Mails not sent yet (or being tried again)' }) pending!: number;
  @ApiProperty({ description: 'Mails refused or given up on' }) failed!: number;
  @ApiProperty({ description: 'Followers who get this change in their daily or weekly digest' }) inDigests!: number;
  @ApiProperty({ nullable: true, type: String }) firstSentAt!: string | null;
  @ApiProperty({ nullable: true, type: String }) lastSentAt!: string | null;
  @ApiProperty({ type: [String], description: 'What the refusing mail servers answered (addresses are not shown)' }) refusals!: string[];
}

/** One check of a build: how the news of its changes reached followers, all changes together. */
export class CheckFitNewsSummaryDto {
  @ApiProperty() checkId!: string;
  @ApiProperty() checkTitle!: string;
  @ApiProperty() assemblyId!: string;
  @ApiProperty() assemblyName!: string;
  @ApiProperty({ description: 'Changes of the check that were news (confirmed, no fit)' }) changes!: number;
  @ApiProperty({ enum: ['confirmed', 'no_fit'], description: 'What the latest news change was' }) lastChangeTo!: string;
  @ApiProperty() lastChangedAt!: string;
  @ApiProperty({ description: 'Mails the followers’ servers accepted (one per follower per change)' }) told!: number;
  @ApiProperty({ description: 'Mails not sent yet (or being tried again)' }) pending!: number;
  @ApiProperty({ description: 'Mails refused or given up on' }) failed!: number;
  @ApiProperty({ description: 'Changes waiting in followers’ daily or weekly digests' }) inDigests!: number;
  @ApiProperty({
    description: 'Mails whose relay stopped between handing them over and recording the answer: sent again with the same Message-ID, so a follower may hold two copies',
  })
  uncertain!: number;
  @ApiProperty({ nullable: true, type: String }) firstSentAt!: string | null;
  @ApiProperty({ nullable: true, type: String }) lastSentAt!: string | null;
}

/** A build's fit news: how many followers were told about its checks' changes, and each check's record. */
export class BuildFitNewsRecordDto {
  @ApiProperty() buildId!: string;
  @ApiProperty({ description: 'Different people told about at least one change of the build’s checks' }) followersTold!: number;
  @ApiProperty() told!: number;
  @ApiProperty() pending!: number;
  @ApiProperty() failed!: number;
  @ApiProperty() inDigests!: number;
  @ApiProperty() uncertain!: number;
  @ApiProperty({ nullable: true, type: String }) firstSentAt!: string | null;
  @ApiProperty({ nullable: true, type: String }) lastSentAt!: string | null;
  @ApiProperty({ type: [CheckFitNewsSummaryDto], description: 'Checks with at least one news change, latest change first' })
  checks!: CheckFitNewsSummaryDto[];
}
