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
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { SignedIn, WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser, WorkshopMembership } from '../common/types/access-context';
import { CreateWorkshopDto, UpdateWorkshopDto } from './dto/workshop.dto';
import { WorkshopView } from './dto/workshop-views.dto';
import { LOGO_MAX_BYTES } from './logo-image';
import { LogoUploadErrorsInterceptor } from './logo-upload-errors.interceptor';
import { WorkshopsService, type UploadedImage } from './workshops.service';

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

  @WorkshopEditor()
  @Put(':workshopId/logo')
  @UseInterceptors(LogoUploadErrorsInterceptor, FileInterceptor('logo', { limits: { fileSize: LOGO_MAX_BYTES, files: 1 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { logo: { type: 'string', format: 'binary' } }, required: ['logo'] } })
  @ApiOkResponse({ type: WorkshopView, description: 'PNG, JPEG or WebP, at most 2 MB' })
  setLogo(
    @CurrentMembership() membership: WorkshopMembership,
    @UploadedFile() file: UploadedImage | undefined,
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
