import { BadRequestException, ConflictException, Inject, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { EventEmitter2, OnEvent } from '@nestjs/event-emitter';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, In, Repository } from 'typeorm';
import { ASSEMBLY_INTERFACES_CHANGED, type AssemblyInterfacesChangedEvent } from '../assemblies/assemblies.events';
import { AssembliesService } from '../assemblies/assemblies.service';
import type { AssemblyInterface } from '../assemblies/entities/assembly-interface.entity';
import type { Assembly } from '../assemblies/entities/assembly.entity';
import { newId } from '../common/database/columns';
import { requireImage, type UploadedFileLike } from '../common/uploads/image-file';
import { StorageService } from '../infra/storage/storage.service';
import { MailOutbox } from '../outbox/mail-outbox.service';
import { canTransition, rollUpChecklist, stateAfterOutcome, stateForOutcome, type FitCheckState } from '../engine/checklist';
import { EngineError } from '../engine/engine-error';
import { evaluateInterface, type InterfaceInput, type InterfaceVerdict, type Reading } from '../engine/interface-evaluation';
import { UsersService } from '../users/users.service';
import { whatIf } from '../engine/measured-fit';
import { toNanometres, type LengthUnit } from '../engine/units';
import { MeasurementsService } from '../measurements/measurements.service';
import { MEASUREMENT_CHANGED, type MeasurementChangedEvent } from '../measurements/measurements.events';
import type { DiameterSpec, LengthSpec, SplineSpec } from '../parts/entities/part-feature.entity';
import type { PartFeature } from '../parts/entities/part-feature.entity';
import { PartsService } from '../parts/parts.service';
import { PART_FEATURE_CHANGED, type PartFeatureChangedEvent } from '../parts/parts.events';
import { AddEvidenceDto, CreateManualCheckDto, TransitionDto } from './dto/fit-check.dto';
import { FitCheckEvent } from './entities/fit-check-event.entity';
import { FitCheckEvidence } from './entities/fit-check-evidence.entity';
import { EvidenceMarks } from './evidence-marks.port';
import { FitCheck, type CheckKind } from './entities/fit-check.entity';
import { FIT_CHECK_CHANGED, type FitCheckChangedEvent } from './fit-checks.events';
import { referenceNotFound } from '../common/http/field-errors';

/** A phone photo of the test fit. */
export const EVIDENCE_PHOTO_MAX_BYTES = 15 * 1024 * 1024;

const CHECK_KIND_FOR_INTERFACE: Record<AssemblyInterface['kind'], CheckKind> = {
  spline: 'spline_match',
  bore_shaft: 'fit',
  length_window: 'length_window',
};

const CHECK_TITLE_PREFIX: Record<AssemblyInterface['kind'], string> = {
  spline: 'Spline match',
  bore_shaft: 'Fit',
  length_window: 'Length window',
};

/**
 * Derives checks from an assembly's interfaces, keeps them in step with parts and readings,
 * takes people's confirmations with evidence, and keeps every change in the history.
 */
@Injectable()
export class FitChecksService {
  private readonly logger = new Logger(FitChecksService.name);

  constructor(
    @InjectRepository(FitCheck) private readonly checks: Repository<FitCheck>,
    @InjectRepository(FitCheckEvent) private readonly events: Repository<FitCheckEvent>,
    @InjectRepository(FitCheckEvidence) private readonly evidence: Repository<FitCheckEvidence>,
    @Inject(AssembliesService) private readonly assemblies: AssembliesService,
    @Inject(PartsService) private readonly parts: PartsService,
    @Inject(MeasurementsService) private readonly measurements: MeasurementsService,
    @Inject(EvidenceMarks) private readonly marks: EvidenceMarks,
    @Inject(EventEmitter2) private readonly emitter: EventEmitter2,
    @Inject(StorageService) private readonly storage: StorageService,
    @Inject(UsersService) private readonly users: UsersService,
    @Inject(MailOutbox) private readonly outbox: MailOutbox,
  ) {}

  // ---- re-evaluation ----

  @OnEvent(PART_FEATURE_CHANGED, { async: true, promisify: true })
  async handleFeatureChanged(event: PartFeatureChangedEvent): Promise<void> {
    const touched = await this.assemblies.interfacesUsingFeature(event.featureId);
    await this.evaluateInterfaces(event.workshopId, touched, event.reason, event.actorId);
  }

  @OnEvent(MEASUREMENT_CHANGED, { async: true, promisify: true })
  async handleMeasurementChanged(event: MeasurementChangedEvent): Promise<void> {
    const touched = event.interfaceId
      ? await this.assemblies.interfacesWithId(event.interfaceId)
      : await this.assemblies.interfacesUsingFeature(event.featureId!);
    await this.evaluateInterfaces(event.workshopId, touched, event.reason, event.actorId);
  }

  /** Re-evaluates every interface of an assembly after one was added or changed; errors reach the request that caused it. */
  @OnEvent(ASSEMBLY_INTERFACES_CHANGED, { async: true, promisify: true, suppressErrors: false })
  async handleAssemblyInterfacesChanged(event: AssemblyInterfacesChangedEvent): Promise<void> {
    const interfaces = await this.assemblies.interfacesOf(event.assemblyId);
    await this.evaluateInterfaces(event.workshopId, interfaces, event.reason, event.actorId);
  }

  private async evaluateInterfaces(
    workshopId: string,
    interfaces: AssemblyInterface[],
    reason: string,
    actorId: string | null,
  ): Promise<void> {
    for (const assemblyInterface of interfaces) {
      const verdict = await this.verdictFor(assemblyInterface);
      await this.applyVerdict(workshopId, assemblyInterface, verdict, reason, actorId);
    }
  }

  async verdictFor(assemblyInterface: AssemblyInterface): Promise<InterfaceVerdict> {
    try {
      return evaluateInterface(await this.interfaceInput(assemblyInterface));
    } catch (error) {
      // Input the engine cannot compute (say, a size beyond the ISO tables) leaves the check open, with the reason.
      if (error instanceof EngineError) return { outcome: 'unknown', summary: 'cannot compute', reasons: [error.message], detail: {} };
      throw error;
    }
  }

  private async interfaceInput(assemblyInterface: AssemblyInterface): Promise<InterfaceInput> {
    const ids = [assemblyInterface.featureAId, assemblyInterface.featureBId].filter((id): id is string => Boolean(id));
    const features = await this.parts.featuresWithParts(ids);
    const readings = await this.measurements.readingsOfFeatures(ids);
    const readingsOf = (featureId: string): Reading[] =>
      readings
        .filter((reading) => reading.featureId === featureId)
        .map((reading) => ({ valueNm: reading.valueNm, resolutionNm: reading.instrumentResolutionNm }));
    const featureA = features.find((feature) => feature.id === assemblyInterface.featureAId)!;
    const featureB = features.find((feature) => feature.id === assemblyInterface.featureBId);
    const label = (feature: PartFeature) => `${feature.name} (${feature.part?.partNumber ?? 'part'})`;
    const unit: LengthUnit = featureA.displayUnit;

    switch (assemblyInterface.kind) {
      case 'spline':
        return {
          kind: 'spline',
          first: { name: label(featureA), ...(featureA.spec as SplineSpec) },
          second: { name: label(featureB!), ...(featureB!.spec as SplineSpec) },
        };
      case 'bore_shaft': {
        const [hole, shaft] = (featureA.spec as DiameterSpec).role === 'hole' ? [featureA, featureB!] : [featureB!, featureA];
        const clearanceReadings = await this.measurements.clearanceReadings(assemblyInterface.id);
        return {
          kind: 'bore_shaft',
          hole: { name: label(hole), ...(hole.spec as DiameterSpec), readings: readingsOf(hole.id) },
          shaft: { name: label(shaft), ...(shaft.spec as DiameterSpec), readings: readingsOf(shaft.id) },
          clearanceReadings: clearanceReadings.map((reading) => ({ valueNm: reading.valueNm, resolutionNm: reading.instrumentResolutionNm })),
          minClearanceNm: assemblyInterface.marginNm ?? 0,
          unit,
        };
      }
      case 'length_window':
        return {
          kind: 'length_window',
          length: { name: label(featureA), ...(featureA.spec as LengthSpec), readings: readingsOf(featureA.id) },
          installedMinNm: assemblyInterface.installedMinNm!,
          installedMaxNm: assemblyInterface.installedMaxNm!,
          marginNm: assemblyInterface.marginNm ?? 0,
          unit,
        };
    }
  }

  private async applyVerdict(
    workshopId: string,
    assemblyInterface: AssemblyInterface,
    verdict: InterfaceVerdict,
    reason: string,
    actorId: string | null,
  ): Promise<void> {
    const existing = await this.checks.findOneBy({ interfaceId: assemblyInterface.id });
    const title = `${CHECK_TITLE_PREFIX[assemblyInterface.kind]}: ${assemblyInterface.name}`;
    const detail = { summary: verdict.summary, reasons: verdict.reasons, ...verdict.detail };
    if (!existing) {
      const check = await this.checks.save(
        this.checks.create({
          workshopId,
          assemblyId: assemblyInterface.assemblyId,
          interfaceId: assemblyInterface.id,
          kind: CHECK_KIND_FOR_INTERFACE[assemblyInterface.kind],
          title,
          required: true,
          state: stateForOutcome(verdict.outcome),
          outcome: verdict.outcome,
          detail,
          reason: verdict.summary,
        }),
      );
      await this.record(check, null, check.state, `derived from the interface: ${verdict.summary}`, actorId);
      return;
    }
    const nextState = stateAfterOutcome(existing.state, existing.outcome, verdict.outcome);
    existing.outcome = verdict.outcome;
    existing.detail = detail;
    existing.title = title;
    if (nextState) {
      const from = existing.state;
      const why = from === 'confirmed' ? `re-opened: ${reason} (now ${verdict.summary})` : `${reason}: ${verdict.summary}`;
      existing.state = nextState;
      existing.reason = why.slice(0, 500);
      if (nextState !== 'confirmed') {
        existing.confirmedBy = null;
        existing.confirmedAt = null;
      }
      await this.record(existing, from, nextState, why, actorId, (manager) => manager.save(existing));
    } else {
      await this.checks.save(existing);
    }
  }

  // ---- the checklist ----

  async checklist(workshopId: string, assemblyId: string) {
    await this.assemblyOf(workshopId, assemblyId);
    const checks = await this.checks.find({ where: { assemblyId }, order: { createdAt: 'ASC' } });
    const evidence = checks.length
      ? await this.evidence.find({ where: { fitCheckId: In(checks.map((check) => check.id)) }, order: { createdAt: 'ASC' } })
      : [];
    const withEvidence = checks.map((check) => ({
      check,
      evidence: evidence.filter((item) => item.fitCheckId === check.id),
    }));
    const verdict = rollUpChecklist(
      withEvidence.map(({ check, evidence: items }) => ({ state: check.state, required: check.required, evidenceCount: items.length })),
    );
    return { verdict, items: withEvidence };
  }

  async createManual(workshopId: string, assemblyId: string, actorId: string, input: CreateManualCheckDto): Promise<FitCheck> {
    await this.assemblyOf(workshopId, assemblyId);
    const check = await this.checks.save(
      this.checks.create({
        workshopId,
        assemblyId,
        interfaceId: null,
        kind: 'manual',
        title: input.title,
        required: input.required ?? true,
        state: 'open',
        outcome: null,
        detail: null,
        reason: '',
      }),
    );
    await this.record(check, null, 'open', 'added by hand', actorId);
    return check;
  }

  /**
   * A change by hand. It is applied only if the check is still in the state it was read in (a
   * conditional UPDATE in the transaction that writes the history), so two identical requests at
   * once (a double click) record and announce one change; the other answers 409 with the state now.
   */
  async transition(workshopId: string, checkId: string, actorId: string, input: TransitionDto): Promise<FitCheck> {
    const check = await this.checkOf(workshopId, checkId);
    if (input.from !== undefined && input.from !== check.state) throw this.stateConflict(check, input.to);
    const evidenceCount = await this.evidence.countBy({ fitCheckId: check.id });
    const verdict = canTransition(
      { state: check.state, required: check.required, evidenceCount, derived: check.interfaceId !== null, outcome: check.outcome },
      input.to,
    );
    if (!verdict.allowed) throw new ConflictException({ message: verdict.message, code: check.state === input.to ? 'already_in_state' : 'transition_refused', state: check.state });

    const from = check.state;
    // Re-opening a derived check hands it back to the engine's verdict.
    const target: FitCheckState =
      input.to === 'open' && check.interfaceId !== null && check.outcome ? stateForOutcome(check.outcome) : input.to;
    const change = {
      state: target,
      reason: input.reason,
      confirmedBy: target === 'confirmed' ? actorId : null,
      confirmedAt: target === 'confirmed' ? new Date() : null,
    };
    const history = await this.checks.manager.transaction(async (manager) => {
      const claimed = await manager.update(FitCheck, { id: check.id, state: from }, change);
      if (!claimed.affected) return null;
      const saved = await this.saveHistory(manager, check.id, from, target, input.reason, actorId);
      await this.recordOutboxEvent(manager, check, saved);
      return saved;
    });
    if (!history) throw this.stateConflict(await this.checkOf(workshopId, checkId), input.to);
    const changed = await this.checkOf(workshopId, checkId);
    await this.announce(changed, history);
    return changed;
  }

  /** Someone (or the same double click) changed the check since it was read. */
  private stateConflict(current: FitCheck, wanted: FitCheckState): ConflictException {
    return current.state === wanted
      ? new ConflictException({ message: `The check is already ${wanted}.`, code: 'already_in_state', state: current.state })
      : new ConflictException({
          message: `The check changed meanwhile: it is ${current.state} now. Look again before changing it.`,
          code: 'state_changed',
          state: current.state,
        });
  }

  async addEvidence(workshopId: string, checkId: string, actorId: string, input: AddEvidenceDto): Promise<FitCheckEvidence> {
    const check = await this.checkOf(workshopId, checkId);
    // Exactly one of the two ids is given (the DTO requires the one its kind names); the other is stored as null.
    const given = input.kind === 'mark' ? input.markId : input.measurementId;
    const found =
      input.kind === 'mark'
        ? await this.marks.existsInWorkshop(workshopId, given!)
        : await this.measurements.existsInWorkshop(workshopId, given!);
    if (!found) throw input.kind === 'mark' ? referenceNotFound('markId', 'Mark') : referenceNotFound('measurementId', 'Measurement');
    // The same mark or reading counts once per check (a check-evidence mark is attached when it is made).
    const already = await this.evidence.findOneBy(input.kind === 'mark' ? { fitCheckId: check.id, markId: given } : { fitCheckId: check.id, measurementId: given });
    if (already) return already;
    return this.evidence.save(
      this.evidence.create({
        fitCheckId: check.id,
        kind: input.kind,
        measurementId: input.kind === 'measurement' ? (given ?? null) : null,
        markId: input.kind === 'mark' ? (given ?? null) : null,
        photoKey: null,
        note: input.note ?? '',
        addedBy: actorId,
      }),
    );
  }

  /** Checks by id (for lists in other domains that name them); unknown ids are simply absent. */
  byIds(ids: string[]): Promise<FitCheck[]> {
    return this.checks.findBy({ id: In(ids) });
  }

  /** Whether the check is the workshop's (for domains that link to checks, such as marks). */
  existsInWorkshop(workshopId: string, checkId: string): Promise<boolean> {
    return this.checks.existsBy({ id: checkId, workshopId });
  }

  /**
   * A check-evidence mark is evidence of its fit check (`checkId`, or none): it is listed with that check's
   * evidence once, and leaves any other check's evidence when the mark moves to another check or becomes another kind.
   */
  async syncMarkEvidence(markId: string, checkId: string | null, actorId: string): Promise<void> {
    const rows = await this.evidence.findBy({ markId });
    const stale = rows.filter((row) => row.fitCheckId !== checkId);
    if (stale.length) await this.evidence.remove(stale);
    if (checkId && !rows.some((row) => row.fitCheckId === checkId)) {
      await this.evidence.save(
        this.evidence.create({ fitCheckId: checkId, kind: 'mark', markId, measurementId: null, photoKey: null, note: '', addedBy: actorId }),
      );
    }
  }

  /** A photo of the test fit, stored in storage and attached as evidence. */
  async addPhotoEvidence(
    workshopId: string,
    checkId: string,
    actorId: string,
    file: UploadedFileLike | undefined,
    note: string,
  ): Promise<FitCheckEvidence> {
    const check = await this.checkOf(workshopId, checkId);
    const image = requireImage(file, { field: 'photo', what: 'The photo', maxBytes: EVIDENCE_PHOTO_MAX_BYTES });
    const key = `workshops/${workshopId}/checks/${check.id}/${newId()}.${image.extension}`;
    await this.storage.putObject(key, image.bytes, image.contentType);
    return this.evidence.save(
      this.evidence.create({ fitCheckId: check.id, kind: 'photo', measurementId: null, markId: null, photoKey: key, note, addedBy: actorId }),
    );
  }

  /** A short-lived link to a photo attached as evidence. */
  async evidencePhotoUrl(workshopId: string, checkId: string, evidenceId: string): Promise<string> {
    const check = await this.checkOf(workshopId, checkId);
    const item = await this.evidence.findOneBy({ id: evidenceId, fitCheckId: check.id, kind: 'photo' });
    if (!item?.photoKey) throw new NotFoundException('Photo not found');
    return this.storage.presignedGetUrl(item.photoKey, 300);
  }

  /** Every state change of a check, oldest first, with the display names of the members who made them. */
  async history(workshopId: string, checkId: string): Promise<{ events: FitCheckEvent[]; actorNames: Map<string, string> }> {
    const check = await this.checkOf(workshopId, checkId);
    const events = await this.events.find({ where: { fitCheckId: check.id }, order: { createdAt: 'ASC' } });
    const actorNames = await this.users.displayNames(events.flatMap((event) => (event.actorId ? [event.actorId] : [])));
    return { events, actorNames };
  }

  /** What a shaft `delta` larger (or smaller, if negative) does to the measured clearance of a bore/shaft interface. */
  async whatIf(workshopId: string, interfaceId: string, delta: string, unit: LengthUnit) {
    const [assemblyInterface] = await this.assemblies.interfacesWithId(interfaceId);
    if (!assemblyInterface) throw new NotFoundException('Interface not found');
    await this.assemblyOf(workshopId, assemblyInterface.assemblyId);
    if (assemblyInterface.kind !== 'bore_shaft') throw new BadRequestException('What-if applies to a bore and shaft interface');
    const verdict = await this.verdictFor(assemblyInterface);
    const clearanceNm = verdict.detail.clearanceMeasuredNm;
    if (typeof clearanceNm !== 'number') {
      throw new ConflictException('Measure the bore and the shaft (or the clearance) first: a what-if works from a measured clearance');
    }
    let deltaNm: number;
    try {
      deltaNm = toNanometres(delta.trim(), unit);
    } catch (error) {
      if (error instanceof EngineError) throw new BadRequestException(`delta: ${error.message}`);
      throw error;
    }
    const shaft = verdict.detail.shaft as { meanNm?: unknown } | null | undefined;
    const shaftNm = typeof shaft?.meanNm === 'number' ? shaft.meanNm : undefined;
    try {
      return whatIf({ clearanceNm, deltaNm, shaftNm });
    } catch (error) {
      if (error instanceof EngineError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  // ---- helpers ----

  /** Stores a change (`applyChange` writes the check itself) with its history and outbox rows in one transaction. */
  private async record(
    check: FitCheck,
    from: FitCheckState | null,
    to: FitCheckState,
    reason: string,
    actorId: string | null,
    applyChange?: (manager: EntityManager) => Promise<unknown>,
  ) {
    const history = await this.events.manager.transaction(async (manager) => {
      await applyChange?.(manager);
      const saved = await this.saveHistory(manager, check.id, from, to, reason, actorId);
      await this.recordOutboxEvent(manager, check, saved);
      return saved;
    });
    await this.announce(check, history);
  }

  /**
   * The change's outbox row, in the transaction that stores the change: fit news (and any other mail a
   * change causes) is relayed from it, so a crash can neither lose the news of a stored change nor tell
   * of one that rolled back.
   */
  private async recordOutboxEvent(manager: EntityManager, check: FitCheck, history: FitCheckEvent): Promise<void> {
    if (history.fromState === history.toState) return;
    await this.outbox.record(manager, FIT_CHECK_CHANGED, this.changedEvent(check, history));
  }

  private changedEvent(check: FitCheck, history: FitCheckEvent): FitCheckChangedEvent {
    return {
      eventId: history.id,
      workshopId: check.workshopId,
      assemblyId: check.assemblyId,
      fitCheckId: check.id,
      title: check.title,
      from: history.fromState,
      to: history.toState,
      reason: history.reason,
      actorId: history.actorId,
      occurredAt: (history.createdAt ?? new Date()).toISOString(),
    };
  }

  private saveHistory(
    manager: EntityManager,
    fitCheckId: string,
    from: FitCheckState | null,
    to: FitCheckState,
    reason: string,
    actorId: string | null,
  ): Promise<FitCheckEvent> {
    return manager.save(FitCheckEvent, manager.create(FitCheckEvent, { fitCheckId, fromState: from, toState: to, reason: reason.slice(0, 500), actorId }));
  }

  /**
   * Tells in-process listeners about a committed change; a row that changed nothing is history only.
   * Mail never hangs on this (a process may die right here): it is relayed from the outbox row.
   */
  private async announce(check: FitCheck, history: FitCheckEvent): Promise<void> {
    if (history.fromState === history.toState) return;
    this.logger.log(`check ${check.id} ${history.fromState ?? 'new'} → ${history.toState}`);
    await this.emitter.emitAsync(FIT_CHECK_CHANGED, this.changedEvent(check, history));
  }

  private assemblyOf(workshopId: string, assemblyId: string): Promise<Assembly> {
    return this.assemblies.get(workshopId, assemblyId); // 404 'Assembly not found' for another workshop's
  }

  private async checkOf(workshopId: string, checkId: string): Promise<FitCheck> {
    const check = await this.checks.findOneBy({ id: checkId, workshopId });
    if (!check) throw new NotFoundException('Fit check not found');
    return check;
  }
}
