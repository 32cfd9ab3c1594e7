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
