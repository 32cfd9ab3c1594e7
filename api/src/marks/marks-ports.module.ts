import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { EvidenceMarks } from '../fit-checks/evidence-marks.port';
import { Mark } from './entities/mark.entity';
import { MarkLookup } from './mark-lookup';

/**
 * The ports other domains declare and marks fill. Global, so a domain that marks import (fit checks) can
 * inject its port without importing marks back.
 */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([Mark])],
  providers: [MarkLookup, { provide: EvidenceMarks, useExisting: MarkLookup }],
  exports: [EvidenceMarks],
})
export class MarksPortsModule {}
