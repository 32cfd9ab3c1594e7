import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Inject,
  Patch,
  Post,
  Put,
  UploadedFile,
} from '@nestjs/common';
import {
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { SignedIn, WorkshopEditor, WorkshopOwner } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser, WorkshopMembership } from '../common/types/access-context';
import { CreateWorkshopDto, DeleteWorkshopDto, UpdateWorkshopDto } from './dto/workshop.dto';
import { WorkshopView } from './dto/workshop-views.dto';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import type { UploadedFileLike } from '../common/uploads/image-file';
import { LOGO_MAX_BYTES, WorkshopsService } from './workshops.service';

@ApiTags('workshops')
@Controller('workshops')
export class WorkshopsController {
  constructor(@Inject(WorkshopsService) private readonly workshops: WorkshopsService) {}

  @SignedIn()
  @Post()
  @ApiCreatedResponse({ type: WorkshopView, description: 'Created; the caller is its owner' })
  create(@CurrentUser() user: SessionUser, @Body() dto: CreateWorkshopDto): Promise<WorkshopView> {
    return this.workshops.create(user, dto);
  }

  @SignedIn()
  @Get()
  @ApiOkResponse({ type: [WorkshopView], description: "The caller's workshops with the caller's role" })
  listMine(@CurrentUser() user: SessionUser): Promise<WorkshopView[]> {
    return this.workshops.listFor(user.id);
  }

  @WorkshopEditor()
  @Get(':workshopId')
  @ApiOkResponse({ type: WorkshopView })
  get(@CurrentMembership() membership: WorkshopMembership): Promise<WorkshopView> {
    return this.workshops.get(membership.workshopId, membership.role);
  }

  @WorkshopEditor()
  @Patch(':workshopId')
  @ApiOkResponse({ type: WorkshopView })
  update(@CurrentMembership() membership: WorkshopMembership, @Body() dto: UpdateWorkshopDto): Promise<WorkshopView> {
    return this.workshops.update(membership, dto);
  }

  /** Everything goes: members, builds, footage, guides, reports and every stored file. Owners only. */
  @WorkshopOwner()
  @Delete(':workshopId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with all its data and files' })
  async remove(@CurrentMembership() membership: WorkshopMembership, @Body() dto: DeleteWorkshopDto): Promise<void> {
    await this.workshops.remove(membership, dto.confirmName);
  }

  @WorkshopEditor()
  @Put(':workshopId/logo')
  @SingleFileUpload('logo', { maxBytes: LOGO_MAX_BYTES, what: 'The logo', expected: 'one image' })
  @ApiOkResponse({ type: WorkshopView, description: 'PNG, JPEG or WebP, at most 2 MB' })
  setLogo(
    @CurrentMembership() membership: WorkshopMembership,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<WorkshopView> {
    return this.workshops.setLogo(membership, file);
  }

  @WorkshopEditor()
  @Delete(':workshopId/logo')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  removeLogo(@CurrentMembership() membership: WorkshopMembership): Promise<void> {
    return this.workshops.removeLogo(membership);
  }
}
