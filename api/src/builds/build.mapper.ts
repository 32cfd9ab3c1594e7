import { BuildResponseDto } from './dto/build.dto';
import { Build } from './entities/build.entity';

export function toBuildResponse(build: Build): BuildResponseDto {
  return {
    id: build.id,
    workshopId: build.workshopId,
    title: build.title,
    vehicle: build.vehicle,
    goal: build.goal,
    status: build.status,
    createdAt: build.createdAt.toISOString(),
    updatedAt: build.updatedAt.toISOString(),
  };
}
