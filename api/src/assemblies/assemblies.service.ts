import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import { BuildsService } from '../builds/builds.service';
import { EngineError } from '../engine/engine-error';
import { formatLengthValue, toNanometres, type LengthUnit } from '../engine/units';
import type { DiameterSpec } from '../parts/entities/part-feature.entity';
import { PartFeature } from '../parts/entities/part-feature.entity';
import { PartsService } from '../parts/parts.service';
import { ASSEMBLY_INTERFACES_CHANGED, type AssemblyInterfacesChangedEvent } from './assemblies.events';
import { toAssemblyDetail } from './assembly.mapper';
import { AssemblyDetailDto, CreateAssemblyDto, CreateInterfaceDto, PlacePartDto, UpdateAssemblyDto, UpdateInterfaceDto } from './dto/assembly.dto';
import { AssemblyInterface } from './entities/assembly-interface.entity';
import { AssemblyPart } from './entities/assembly-part.entity';
import { Assembly } from './entities/assembly.entity';

const FEATURE_KIND_FOR_INTERFACE = { spline: 'spline', bore_shaft: 'diameter', length_window: 'length' } as const;

@Injectable()
export class AssembliesService {
  constructor(
    @InjectRepository(Assembly) private readonly assemblies: Repository<Assembly>,
    @InjectRepository(AssemblyPart) private readonly placements: Repository<AssemblyPart>,
    @InjectRepository(AssemblyInterface) private readonly interfaces: Repository<AssemblyInterface>,
    @InjectRepository(PartFeature) private readonly features: Repository<PartFeature>,
    @Inject(BuildsService) private readonly builds: BuildsService,
    @Inject(PartsService) private readonly parts: PartsService,
    @Inject(EventEmitter2) private readonly events: EventEmitter2,
  ) {}

  async list(workshopId: string, buildId: string): Promise<Assembly[]> {
    await this.builds.get(workshopId, buildId);
    return this.assemblies.find({ where: { workshopId, buildId }, order: { createdAt: 'ASC' } });
  }

  async create(workshopId: string, buildId: string, input: CreateAssemblyDto): Promise<Assembly> {
    await this.builds.get(workshopId, buildId);
    return this.assemblies.save(this.assemblies.create({ workshopId, buildId, name: input.name, notes: input.notes ?? '' }));
  }

  /** Assemblies by id (for lists in other domains that name them); unknown ids are simply absent. */
  byIds(ids: string[]): Promise<Assembly[]> {
    return this.assemblies.findBy({ id: In(ids) });
  }

  async get(workshopId: string, assemblyId: string): Promise<Assembly> {
    const assembly = await this.assemblies.findOneBy({ id: assemblyId, workshopId });
    if (!assembly) throw new NotFoundException('Assembly not found');
    return assembly;
  }

  /** The interfaces of an assembly, of one feature (either side) or with one id: what fit checks evaluate. */
  interfacesOf(assemblyId: string): Promise<AssemblyInterface[]> {
    return this.interfaces.find({ where: { assemblyId } });
  }

  interfacesUsingFeature(featureId: string): Promise<AssemblyInterface[]> {
    return this.interfaces.find({ where: [{ featureAId: featureId }, { featureBId: featureId }] });
  }

  interfacesWithId(interfaceId: string): Promise<AssemblyInterface[]> {
    return this.interfaces.find({ where: { id: interfaceId } });
  }

  async detail(workshopId: string, assemblyId: string): Promise<AssemblyDetailDto> {
    const assembly = await this.get(workshopId, assemblyId);
    const placements = await this.placements.find({ where: { assemblyId } });
    const parts = await Promise.all(placements.map((placement) => this.parts.get(workshopId, placement.partId)));
    const interfaces = await this.interfaces.find({ where: { assemblyId }, order: { createdAt: 'ASC' } });
    const featureUnits = await this.featureUnits(interfaces.map((item) => item.featureAId));
    return toAssemblyDetail(
      assembly,
      placements,
      parts,
      interfaces.map((assemblyInterface) => ({ assemblyInterface, unit: featureUnits.get(assemblyInterface.featureAId) ?? 'mm' })),
    );
  }

  async update(workshopId: string, assemblyId: string, input: UpdateAssemblyDto): Promise<Assembly> {
    const assembly = await this.get(workshopId, assemblyId);
    Object.assign(assembly, input);
    return this.assemblies.save(assembly);
  }

  async remove(workshopId: string, assemblyId: string): Promise<void> {
    await this.assemblies.remove(await this.get(workshopId, assemblyId));
  }

  async placePart(workshopId: string, assemblyId: string, partId: string, input: PlacePartDto): Promise<void> {
    await this.get(workshopId, assemblyId);
    await this.parts.get(workshopId, partId);
    await this.placements.save(this.placements.create({ assemblyId, partId, position: input.position, sortOrder: input.sortOrder ?? 0 }));
  }

  async removePart(workshopId: string, assemblyId: string, partId: string): Promise<void> {
    await this.get(workshopId, assemblyId);
    const inUse = await this.interfaces
      .createQueryBuilder('i')
      .innerJoin(PartFeature, 'f', 'f.id = i.feature_a_id OR f.id = i.feature_b_id')
      .where('i.assembly_id = :assemblyId AND f.part_id = :partId', { assemblyId, partId })
      .getCount();
    if (inUse > 0) throw new BadRequestException('An interface of this assembly uses this part; remove the interface first');
    await this.placements.delete({ assemblyId, partId });
  }

  async addInterface(workshopId: string, assemblyId: string, actorId: string, input: CreateInterfaceDto): Promise<AssemblyInterface> {
    await this.get(workshopId, assemblyId);
    const assemblyInterface = this.interfaces.create({ assemblyId });
    await this.applyInterfaceInput(assemblyInterface, input);
    await this.interfaces.save(assemblyInterface);
    await this.interfacesChanged({ workshopId, assemblyId, actorId, reason: `interface "${assemblyInterface.name}" added` });
    return assemblyInterface;
  }

  async updateInterface(
    workshopId: string,
    assemblyId: string,
    interfaceId: string,
    actorId: string,
    input: UpdateInterfaceDto,
  ): Promise<AssemblyInterface> {
    await this.get(workshopId, assemblyId);
    const assemblyInterface = await this.interfaces.findOneBy({ id: interfaceId, assemblyId });
    if (!assemblyInterface) throw new NotFoundException('Interface not found');
    const unit = (await this.featureUnits([assemblyInterface.featureAId])).get(assemblyInterface.featureAId) ?? 'mm';
    const current: CreateInterfaceDto = {
      kind: assemblyInterface.kind,
      name: assemblyInterface.name,
      featureAId: assemblyInterface.featureAId,
      featureBId: assemblyInterface.featureBId ?? undefined,
      unit,
      installedMin: this.written(assemblyInterface.installedMinNm, unit),
      installedMax: this.written(assemblyInterface.installedMaxNm, unit),
      margin: this.written(assemblyInterface.marginNm, unit),
    };
    // Lengths given in another unit replace the stored ones; those not given keep their value.
    const merged = { ...current, ...input };
    if (input.unit && input.unit !== unit) {
      for (const field of ['installedMin', 'installedMax', 'margin'] as const) {
        const stored = { installedMin: assemblyInterface.installedMinNm, installedMax: assemblyInterface.installedMaxNm, margin: assemblyInterface.marginNm }[field];
        if (input[field] === undefined) merged[field] = this.written(stored, input.unit);
      }
    }
    await this.applyInterfaceInput(assemblyInterface, merged);
    await this.interfaces.save(assemblyInterface);
    await this.interfacesChanged({ workshopId, assemblyId, actorId, reason: `interface "${assemblyInterface.name}" changed` });
    return assemblyInterface;
  }

  /** Waits for the listeners (fit checks re-evaluate), so the answer already reflects the new checks. */
  private async interfacesChanged(event: AssemblyInterfacesChangedEvent): Promise<void> {
    await this.events.emitAsync(ASSEMBLY_INTERFACES_CHANGED, event);
  }

  async removeInterface(workshopId: string, assemblyId: string, interfaceId: string): Promise<void> {
    await this.get(workshopId, assemblyId);
    const assemblyInterface = await this.interfaces.findOneBy({ id: interfaceId, assemblyId });
    if (!assemblyInterface) throw new NotFoundException('Interface not found');
    await this.interfaces.remove(assemblyInterface);
  }

  /** Checks the features belong to parts placed in this assembly and suit the interface's kind. */
  private async applyInterfaceInput(target: AssemblyInterface, input: CreateInterfaceDto): Promise<void> {
    const ids = [input.featureAId, input.kind === 'length_window' ? undefined : input.featureBId].filter((id): id is string => Boolean(id));
    const features = await this.features
      .createQueryBuilder('f')
      .innerJoin(AssemblyPart, 'ap', 'ap.part_id = f.part_id AND ap.assembly_id = :assemblyId', { assemblyId: target.assemblyId })
      .where({ id: In(ids) })
      .getMany();
    if (features.length !== ids.length) {
      const missing = features.some((feature) => feature.id === ids[0]) ? 'featureBId' : 'featureAId';
      const sentence = 'Each feature must belong to a part placed in this assembly';
      throw new BadRequestException({ message: sentence, errors: { [missing]: sentence } });
    }
    const wanted = FEATURE_KIND_FOR_INTERFACE[input.kind];
    const wrong = features.find((feature) => feature.kind !== wanted);
    if (wrong) throw new BadRequestException(`A ${input.kind} interface joins ${wanted} features; "${wrong.name}" is a ${wrong.kind}`);
    if (input.kind === 'bore_shaft') {
      const roles = features.map((feature) => (feature.spec as DiameterSpec).role).sort();
      if (roles.join() !== 'hole,shaft') throw new BadRequestException('A bore and shaft interface joins one hole and one shaft');
    }
    if (input.kind === 'spline' && ids[0] === ids[1]) throw new BadRequestException('A spline cannot mate with itself');

    target.kind = input.kind;
    target.name = input.name;
    target.featureAId = input.featureAId;
    target.featureBId = input.kind === 'length_window' ? null : input.featureBId!;
    const unit = input.unit ?? 'mm';
    target.installedMinNm = input.kind === 'length_window' ? this.length(input.installedMin!, unit, 'installedMin') : null;
    target.installedMaxNm = input.kind === 'length_window' ? this.length(input.installedMax!, unit, 'installedMax') : null;
    target.marginNm = input.margin ? this.length(input.margin, unit, 'margin') : null;
    if (target.installedMinNm !== null && target.installedMaxNm !== null && target.installedMinNm > target.installedMaxNm) {
      throw new BadRequestException('installedMin must not exceed installedMax');
    }
  }

  private written(nanometres: number | null, unit: LengthUnit): string | undefined {
    return nanometres === null ? undefined : formatLengthValue(nanometres, unit);
  }

  private length(text: string, unit: LengthUnit, field: string): number {
    try {
      return toNanometres(text.trim(), unit);
    } catch (error) {
      if (error instanceof EngineError) throw new BadRequestException(`${field}: ${error.message}`);
      throw error;
    }
  }

  private async featureUnits(featureIds: string[]): Promise<Map<string, LengthUnit>> {
    if (featureIds.length === 0) return new Map();
    const features = await this.features.find({ where: { id: In(featureIds) } });
    return new Map(features.map((feature) => [feature.id, feature.displayUnit]));
  }
}
