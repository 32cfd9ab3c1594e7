import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, Repository } from 'typeorm';
import { referenceNotFound } from '../common/http/field-errors';
import { EngineError } from '../engine/engine-error';
import { toNanometres } from '../engine/units';
import { CreateMeasurementDto, ListMeasurementsQueryDto } from './dto/measurement.dto';
import { Measurement } from './entities/measurement.entity';
import { MEASUREMENT_CHANGED, MeasurementChangedEvent } from './measurements.events';

@Injectable()
export class MeasurementsService {
  constructor(
    @InjectRepository(Measurement) private readonly measurements: Repository<Measurement>,
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(EventEmitter2) private readonly events: EventEmitter2,
  ) {}

  list(workshopId: string, query: ListMeasurementsQueryDto): Promise<Measurement[]> {
    return this.measurements.find({
      where: {
        workshopId,
        ...(query.featureId ? { featureId: query.featureId } : {}),
        ...(query.interfaceId ? { interfaceId: query.interfaceId } : {}),
      },
      order: { takenAt: 'ASC', createdAt: 'ASC' },
    });
  }

  /** Whether the reading is the workshop's (for domains that link to readings: marks, fit-check evidence). */
  existsInWorkshop(workshopId: string, measurementId: string): Promise<boolean> {
    return this.measurements.existsBy({ id: measurementId, workshopId });
  }

  /** Every reading of these part features (fit checks evaluate interfaces from them). */
  readingsOfFeatures(featureIds: string[]): Promise<Measurement[]> {
    return this.measurements.find({ where: { featureId: In(featureIds) } });
  }

  /** The clearance readings taken across an interface. */
  clearanceReadings(interfaceId: string): Promise<Measurement[]> {
    return this.measurements.find({ where: { interfaceId, quantity: 'clearance' } });
  }

  /**
   * A reading taken at a mark's moment moves with the mark (from `fromMs` to `toMs` in that footage); one tied
   * to another moment keeps its own.
   */
  async followMark(measurementId: string, footageId: string, fromMs: number, toMs: number): Promise<void> {
    await this.measurements.update({ id: measurementId, footageId, footageTimeMs: fromMs }, { footageTimeMs: toMs });
  }

  async create(workshopId: string, actorId: string, input: CreateMeasurementDto): Promise<Measurement> {
    if (Boolean(input.featureId) === Boolean(input.interfaceId)) {
      throw new BadRequestException('Give exactly one subject: featureId (a part feature) or interfaceId (an interface)');
    }
    const subject = await this.describeSubject(workshopId, input.featureId ?? null, input.interfaceId ?? null);
    await this.checkFootageMoment(workshopId, input.footageId, input.footageTimeMs);
    const valueNm = this.nanometres(input.value, input.unit, 'value');
    const resolutionNm = this.nanometres(input.resolution, input.unit, 'resolution');
    if (resolutionNm <= 0) throw new BadRequestException('resolution must be greater than zero');

    const measurement = await this.measurements.save(
      this.measurements.create({
        workshopId,
        featureId: input.featureId ?? null,
        interfaceId: input.interfaceId ?? null,
        quantity: input.quantity,
        valueText: input.value.trim(),
        unit: input.unit,
        valueNm,
        instrumentKind: input.instrumentKind,
        instrumentResolutionNm: resolutionNm,
        instrumentCalibratedOn: input.calibratedOn ?? null,
        instrumentNote: input.instrumentNote ?? '',
        temperatureC: input.temperatureC ?? null,
        takenBy: actorId,
        takenAt: input.takenAt ? new Date(input.takenAt) : new Date(),
        footageId: input.footageId ?? null,
        footageTimeMs: input.footageTimeMs ?? null,
        note: input.note ?? '',
      }),
    );
    await this.announce({
      workshopId,
      featureId: measurement.featureId,
      interfaceId: measurement.interfaceId,
      actorId,
      reason: `new reading of ${subject}: ${measurement.valueText} ${measurement.unit}`,
    });
    return measurement;
  }

  async remove(workshopId: string, actorId: string, measurementId: string): Promise<void> {
    const measurement = await this.measurements.findOneBy({ id: measurementId, workshopId });
    if (!measurement) throw new NotFoundException('Measurement not found');
    const subject = await this.describeSubject(workshopId, measurement.featureId, measurement.interfaceId);
    await this.measurements.remove(measurement);
    await this.announce({
      workshopId,
      featureId: measurement.featureId,
      interfaceId: measurement.interfaceId,
      actorId,
      reason: `a reading of ${subject} was removed`,
    });
  }

  /** Checks the subject belongs to this workshop and names it for people. */
  private async describeSubject(workshopId: string, featureId: string | null, interfaceId: string | null): Promise<string> {
    if (featureId) {
      const [row] = await this.dataSource.query<{ name: string; part_number: string }[]>(
        `SELECT f.name, p.part_number FROM part_features f JOIN parts p ON p.id = f.part_id
         WHERE f.id = ? AND p.workshop_id = ?`,
        [featureId, workshopId],
      );
      if (!row) throw referenceNotFound('featureId', 'Part feature');
      return `${row.name} on ${row.part_number}`;
    }
    const [row] = await this.dataSource.query<{ name: string }[]>(
      `SELECT i.name FROM assembly_interfaces i JOIN assemblies a ON a.id = i.assembly_id
       WHERE i.id = ? AND a.workshop_id = ?`,
      [interfaceId, workshopId],
    );
    if (!row) throw referenceNotFound('interfaceId', 'Interface');
    return row.name;
  }

  /** The footage must be this workshop's, and the moment inside it (when its length is known). */
  private async checkFootageMoment(workshopId: string, footageId: string | undefined, timeMs: number | undefined): Promise<void> {
    if (!footageId) {
      if (timeMs !== undefined) throw fieldError('footageTimeMs', 'footageTimeMs needs footageId: say which footage shows the reading');
      return;
    }
    const [footage] = await this.dataSource.query<{ duration_ms: number | null }[]>(
      'SELECT duration_ms FROM footage WHERE id = ? AND workshop_id = ?',
      [footageId, workshopId],
    );
    if (!footage) throw referenceNotFound('footageId', 'Footage');
    if (timeMs !== undefined && footage.duration_ms !== null && timeMs > footage.duration_ms) {
      throw fieldError('footageTimeMs', `footageTimeMs ${timeMs} is past the end of the footage (${footage.duration_ms} ms)`);
    }
  }

  private nanometres(value: string, unit: CreateMeasurementDto['unit'], field: string): number {
    try {
      return toNanometres(value.trim(), unit);
    } catch (error) {
      if (error instanceof EngineError) throw new BadRequestException(`${field}: ${error.message}`);
      throw error;
    }
  }

  private announce(event: MeasurementChangedEvent): Promise<unknown> {
    return this.events.emitAsync(MEASUREMENT_CHANGED, event);
  }
}

function fieldError(field: string, sentence: string): BadRequestException {
  return new BadRequestException({ message: sentence, errors: { [field]: sentence } });
}
