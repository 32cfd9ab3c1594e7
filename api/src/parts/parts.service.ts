import { BadRequestException, ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, DataSource, In, Repository } from 'typeorm';
import { CreatePartDto, FeatureInputDto, ListPartsQueryDto, UpdateFeatureDto, UpdatePartDto } from './dto/part.dto';
import { PartFeature } from './entities/part-feature.entity';
import { Part, partNumberKey } from './entities/part.entity';
import { newId } from '../common/database/columns';
import { requireImage, type UploadedFileLike } from '../common/uploads/image-file';
import { formatLengthValue } from '../engine/units';
import { StorageService } from '../infra/storage/storage.service';
import { toFeatureSpec } from './feature-spec';
import { photoIdOf } from '../common/uploads/photo-id';
import { PART_FEATURE_CHANGED, PartFeatureChangedEvent } from './parts.events';

const DUPLICATE_ENTRY = 'ER_DUP_ENTRY';
/** Shop photos straight from a phone run to a few megabytes. */
export const PART_PHOTO_MAX_BYTES = 15 * 1024 * 1024;
const MAX_PHOTOS_PER_PART = 20;

/**
 * Spline spec keys stored under other names than the ones typed (`fit` is typed `splineFit`,
 * `toleranceClass` is typed `splineClass`, apart from a diameter's ISO 286 class), so reading a spec
 * back into input must rename them or an update would drop them.
 */
const SPLINE_INPUT_NAMES = { fit: 'splineFit', toleranceClass: 'splineClass' } as const;

@Injectable()
export class PartsService {
  constructor(
    @InjectRepository(Part) private readonly parts: Repository<Part>,
    @InjectRepository(PartFeature) private readonly features: Repository<PartFeature>,
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(EventEmitter2) private readonly events: EventEmitter2,
    @Inject(StorageService) private readonly storage: StorageService,
  ) {}

  async list(workshopId: string, query: ListPartsQueryDto): Promise<Part[]> {
    const builder = this.parts.createQueryBuilder('part').where('part.workshop_id = :workshopId', { workshopId });
    if (query.q) {
      const key = partNumberKey(query.q);
      builder.andWhere(
        new Brackets((match) => {
          if (key) match.orWhere('part.part_number_key LIKE :key', { key: `%${key}%` });
          match.orWhere('part.title LIKE :text', { text: `%${query.q}%` }).orWhere('part.maker LIKE :text');
        }),
      );
    }
    if (query.category) builder.andWhere('part.category = :category', { category: query.category });
    if (query.featureKind) {
      builder.andWhere('EXISTS (SELECT 1 FROM part_features f WHERE f.part_id = part.id AND f.kind = :featureKind)', {
        featureKind: query.featureKind,
      });
    }
    if (query.splineTeeth !== undefined) {
      builder.andWhere(
        "EXISTS (SELECT 1 FROM part_features f WHERE f.part_id = part.id AND f.kind = 'spline' AND JSON_VALUE(f.spec, '$.teeth') = :teeth)",
        { teeth: query.splineTeeth },
      );
    }
    const parts = await builder.orderBy('part.part_number', 'ASC').getMany();
    await this.attachFeatures(parts);
    return parts;
  }

  async get(workshopId: string, partId: string): Promise<Part> {
    const part = await this.parts.findOneBy({ id: partId, workshopId });
    if (!part) throw new NotFoundException('Part not found');
    await this.attachFeatures([part]);
    return part;
  }

  /** Whether the part is the workshop's (for domains that link to parts, such as marks). */
  existsInWorkshop(workshopId: string, partId: string): Promise<boolean> {
    return this.parts.existsBy({ id: partId, workshopId });
  }

  /** Features by id with their parts loaded (fit checks label and evaluate interfaces with them). */
  featuresWithParts(featureIds: string[]): Promise<PartFeature[]> {
    return this.features.find({ where: { id: In(featureIds) }, relations: { part: true } });
  }

  async create(workshopId: string, input: CreatePartDto): Promise<Part> {
    const specs = (input.features ?? []).map((feature) => ({ feature, spec: toFeatureSpec(feature) }));
    const part = this.parts.create({
      workshopId,
      partNumber: input.partNumber.trim(),
      partNumberKey: partNumberKey(input.partNumber),
      maker: input.maker ?? '',
      title: input.title,
      category: input.category,
      source: input.source ?? 'new',
      notes: input.notes ?? '',
      photoKeys: [],
    });
    await this.saveUnique(async () => {
      await this.dataSource.transaction(async (manager) => {
        await manager.save(part);
        part.features = await manager.save(
          specs.map(({ feature, spec }) =>
            this.features.create({ partId: part.id, name: feature.name, kind: feature.kind, spec, displayUnit: feature.unit ?? 'mm' }),
          ),
        );
      });
    }, `Part number ${input.partNumber} is already in this workshop, or two features share a name`);
    return part;
  }

  async update(workshopId: string, partId: string, input: UpdatePartDto): Promise<Part> {
    const part = await this.get(workshopId, partId);
    Object.assign(part, input);
    if (input.partNumber !== undefined) {
      part.partNumber = input.partNumber.trim();
      part.partNumberKey = partNumberKey(input.partNumber);
    }
    const features = part.features;
    await this.saveUnique(() => this.parts.save(part), `Part number ${input.partNumber} is already in this workshop`);
    part.features = features;
    return part;
  }

  async remove(workshopId: string, partId: string): Promise<void> {
    const part = await this.get(workshopId, partId);
    try {
      await this.parts.remove(part);
    } catch (error) {
      if (isForeignKeyError(error)) {
        throw new ConflictException('This part is used in an assembly; remove it from the assembly first');
      }
      throw error;
    }
  }

  /** Stores a photo (PNG, JPEG or WebP, checked by content) in storage and lists it on the part. */
  async addPhoto(workshopId: string, partId: string, file: UploadedFileLike | undefined): Promise<Part> {
    const part = await this.get(workshopId, partId);
    if (part.photoKeys.length >= MAX_PHOTOS_PER_PART) {
      throw new BadRequestException(`A part keeps at most ${MAX_PHOTOS_PER_PART} photos; remove one first`);
    }
    const image = requireImage(file, { field: 'photo', what: 'The photo', maxBytes: PART_PHOTO_MAX_BYTES });
    const key = `workshops/${workshopId}/parts/${part.id}/${newId()}.${image.extension}`;
    await this.storage.putObject(key, image.bytes, image.contentType);
    part.photoKeys = [...part.photoKeys, key];
    await this.parts.update({ id: part.id }, { photoKeys: part.photoKeys });
    return part;
  }

  /** A short-lived link to one of the part's photos. */
  async photoUrl(workshopId: string, partId: string, photoId: string): Promise<string> {
    const part = await this.get(workshopId, partId);
    return this.storage.presignedGetUrl(this.photoKey(part, photoId), 300);
  }

  async removePhoto(workshopId: string, partId: string, photoId: string): Promise<void> {
    const part = await this.get(workshopId, partId);
    const key = this.photoKey(part, photoId);
    await this.parts.update({ id: part.id }, { photoKeys: part.photoKeys.filter((candidate) => candidate !== key) });
    await this.storage.deleteObject(key);
  }

  private photoKey(part: Part, photoId: string): string {
    const key = part.photoKeys.find((candidate) => photoIdOf(candidate) === photoId);
    if (!key) throw new NotFoundException('Photo not found');
    return key;
  }

  async addFeature(workshopId: string, partId: string, input: FeatureInputDto): Promise<PartFeature> {
    const part = await this.get(workshopId, partId);
    const feature = this.features.create({
      partId: part.id,
      name: input.name,
      kind: input.kind,
      spec: toFeatureSpec(input),
      displayUnit: input.unit ?? 'mm',
    });
    await this.saveUnique(() => this.features.save(feature), `${part.partNumber} already has a feature named "${input.name}"`);
    return feature;
  }

  async updateFeature(
    workshopId: string,
    partId: string,
    featureId: string,
    actorId: string,
    input: UpdateFeatureDto,
  ): Promise<PartFeature> {
    const part = await this.get(workshopId, partId);
    const feature = part.features?.find((candidate) => candidate.id === featureId);
    if (!feature) throw new NotFoundException('Feature not found');
    // A changed feature is re-read whole, so a partial update still yields a valid spec.
    const merged: FeatureInputDto = { ...this.toInput(feature), ...input, kind: feature.kind };
    // A field sent as null is cleared, so a spline can switch from diametral pitch to module and a
    // diameter from an ISO class to explicit limits without the old value lingering in the merge.
    for (const key of Object.keys(merged) as (keyof FeatureInputDto)[]) {
      if (merged[key] === null) delete merged[key];
    }
    feature.name = merged.name;
    feature.displayUnit = merged.unit ?? feature.displayUnit;
    feature.spec = toFeatureSpec(merged);
    await this.saveUnique(() => this.features.save(feature), `${part.partNumber} already has a feature named "${merged.name}"`);
    await this.announce({
      workshopId,
      featureId: feature.id,
      actorId,
      reason: `${feature.name} on ${part.partNumber} changed`,
    });
    return feature;
  }

  async removeFeature(workshopId: string, partId: string, featureId: string): Promise<void> {
    const part = await this.get(workshopId, partId);
    const feature = part.features?.find((candidate) => candidate.id === featureId);
    if (!feature) throw new NotFoundException('Feature not found');
    try {
      await this.features.remove(feature);
    } catch (error) {
      if (isForeignKeyError(error)) {
        throw new ConflictException('An assembly interface uses this feature; remove the interface first');
      }
      throw error;
    }
  }

  /** Features of several parts in one query. */
  private async attachFeatures(parts: Part[]): Promise<void> {
    if (parts.length === 0) return;
    const features = await this.features.find({ where: { partId: In(parts.map((part) => part.id)) } });
    for (const part of parts) part.features = features.filter((feature) => feature.partId === part.id);
  }

  /** The feature as it would be typed, so a partial update can be validated as a whole. */
  private toInput(feature: PartFeature): FeatureInputDto {
    const spec = feature.spec as unknown as Record<string, unknown>;
    const unit = feature.displayUnit;
    const input: Record<string, unknown> = { name: feature.name, kind: feature.kind, unit };
    for (const [key, value] of Object.entries(spec)) {
      if (key.endsWith('Nm') && typeof value === 'number') {
        input[key.slice(0, -2)] = formatLengthValue(value, unit);
      } else if (key === 'unit') {
        input.freeUnit = value;
      } else if (feature.kind === 'spline' && key in SPLINE_INPUT_NAMES) {
        input[SPLINE_INPUT_NAMES[key as keyof typeof SPLINE_INPUT_NAMES]] = value;
      } else {
        input[key] = value;
      }
    }
    return input as unknown as FeatureInputDto;
  }

  private announce(event: PartFeatureChangedEvent): Promise<unknown> {
    return this.events.emitAsync(PART_FEATURE_CHANGED, event);
  }

  private async saveUnique<T>(save: () => Promise<T>, message: string): Promise<T> {
    try {
      return await save();
    } catch (error) {
      if ((error as { code?: string }).code === DUPLICATE_ENTRY) throw new ConflictException(message);
      throw error;
    }
  }
}

function isForeignKeyError(error: unknown): boolean {
  const code = (error as { code?: string }).code;
  return code === 'ER_ROW_IS_REFERENCED_2' || code === 'ER_ROW_IS_REFERENCED';
}
