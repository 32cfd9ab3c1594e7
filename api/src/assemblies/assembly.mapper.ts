import { formatLengthValue, type LengthUnit } from '../engine/units';
import { toPartResponse } from '../parts/part.mapper';
import { Part } from '../parts/entities/part.entity';
import type { AssemblyDetailDto, AssemblyResponseDto, InterfaceResponseDto } from './dto/assembly.dto';
import { AssemblyInterface } from './entities/assembly-interface.entity';
import { AssemblyPart } from './entities/assembly-part.entity';
import { Assembly } from './entities/assembly.entity';

export function toAssemblyResponse(assembly: Assembly): AssemblyResponseDto {
  return {
    id: assembly.id,
    buildId: assembly.buildId,
    name: assembly.name,
    notes: assembly.notes,
    createdAt: assembly.createdAt.toISOString(),
    updatedAt: assembly.updatedAt.toISOString(),
  };
}

export function toInterfaceResponse(assemblyInterface: AssemblyInterface, unit: LengthUnit = 'mm'): InterfaceResponseDto {
  const show = (nm: number | null) => (nm === null ? null : formatLengthValue(nm, unit));
  return {
    id: assemblyInterface.id,
    kind: assemblyInterface.kind,
    name: assemblyInterface.name,
    featureAId: assemblyInterface.featureAId,
    featureBId: assemblyInterface.featureBId,
    unit,
    installedMinNm: assemblyInterface.installedMinNm,
    installedMaxNm: assemblyInterface.installedMaxNm,
    marginNm: assemblyInterface.marginNm,
    installedMin: show(assemblyInterface.installedMinNm),
    installedMax: show(assemblyInterface.installedMaxNm),
    margin: show(assemblyInterface.marginNm),
  };
}

export function toAssemblyDetail(
  assembly: Assembly,
  placements: AssemblyPart[],
  parts: Part[],
  interfaces: { assemblyInterface: AssemblyInterface; unit: LengthUnit }[],
): AssemblyDetailDto {
  return {
    ...toAssemblyResponse(assembly),
    parts: placements
      .map((placement) => {
        const part = parts.find((candidate) => candidate.id === placement.partId)!;
        return { position: placement.position, sortOrder: placement.sortOrder, part: toPartResponse(part) };
      })
      .sort((a, b) => a.sortOrder - b.sortOrder || a.position.localeCompare(b.position)),
    interfaces: interfaces.map(({ assemblyInterface, unit }) => toInterfaceResponse(assemblyInterface, unit)),
  };
}
