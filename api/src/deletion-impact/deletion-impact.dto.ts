import { ApiProperty } from '@nestjs/swagger';

export class DeletionImpactItemDto {
  @ApiProperty({ example: 'fitChecks', description: 'What kind of thing' })
  key!: string;

  @ApiProperty({ example: 4 })
  count!: number;

  @ApiProperty({ example: '4 fit checks', description: 'The count in words, as the studio shows it' })
  text!: string;

  @ApiProperty({ enum: ['deleted', 'unlinked'], description: 'Deleted with it, or kept but no longer pointing at it' })
  effect!: 'deleted' | 'unlinked';
}

/** What a delete would take with it, counted before the creator confirms. Only kinds with a count above 0. */
export class DeletionImpactDto {
  @ApiProperty({ example: 'Coupler install' })
  name!: string;

  @ApiProperty({ type: [DeletionImpactItemDto] })
  items!: DeletionImpactItemDto[];
}
