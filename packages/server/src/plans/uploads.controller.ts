import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Req,
  StreamableFile,
  UploadedFile,
  UseGuards,
  UseInterceptors,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiPayloadTooLargeResponse,
  ApiServiceUnavailableResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../auth/public.decorator';
import { CurrentSession } from '../auth/current-session.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { UploadRefusedError } from './plans.errors';
import {
  AttachmentDto,
  DrawingDto,
  SetDrawingUnitsDto,
  toAttachmentDto,
  toDrawingDto,
  UploadAttachmentDto,
  UploadDrawingDto,
} from './dto/revision.dto';
import { isTextMediaType } from './file-kinds';
import { OptionalSessionGuard, viewerOf } from './optional-session.guard';
import { SingleFileUpload } from './upload.interceptor';
import { ATTACHMENT_MAX_BYTES, DRAWING_MAX_BYTES, UploadsService, type ReceivedFile } from './uploads.service';

const REVISION = 'plans/:slug/revisions/:number';

function fileOf(file: ReceivedFile | undefined): ReceivedFile {
  if (!file) throw new UploadRefusedError('file_missing', 'Choose a file to upload (the form field `file`).');
  return file;
}

/** `attachment` with the name twice: plain ASCII for old clients, RFC 6266/5987 UTF-8 for the rest. */
export function contentDisposition(name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

@ApiTags('revisions')
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in (changes)' })
@ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's plan, or you are suspended (changes)" })
@ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan, revision, drawing or attachment' })
@Controller()
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  @Post(`${REVISION}/drawings`)
  @UseInterceptors(SingleFileUpload('drawing', DRAWING_MAX_BYTES))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ type: UploadDrawingDto })
  @ApiCreatedResponse({
    type: DrawingDto,
    description: 'Stored and queued for analysis; poll the revision for its status',
  })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: '`binary_dxf`, `not_dxf` or `file_missing`' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`duplicate_drawing` (same SHA-256), or not a draft' })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto, description: `Larger than ${DRAWING_MAX_BYTES} bytes` })
  @ApiServiceUnavailableResponse({ type: ApiErrorDto, description: 'The file store is down; nothing was kept' })
  async uploadDrawing(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @UploadedFile() file: ReceivedFile | undefined,
    @Body() form: UploadDrawingDto,
  ): Promise<DrawingDto> {
    const { drawing } = await this.uploads.uploadDrawing(session, slug, number, fileOf(file), form.units);
    return toDrawingDto(drawing);
  }

  @Patch(`${REVISION}/drawings/:drawingId`)
  @ApiOkResponse({ type: DrawingDto, description: 'Units set; the drawing is analysed again' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`drawing_has_units`, or not a draft' })
  async setUnits(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Param('drawingId', ParseIntPipe) drawingId: number,
    @Body() body: SetDrawingUnitsDto,
  ): Promise<DrawingDto> {
    const { drawing } = await this.uploads.setUnits(session, slug, number, drawingId, body.units);
    return toDrawingDto(drawing);
  }

  @Delete(`${REVISION}/drawings/:drawingId`)
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The drawing, its parts and its file are gone' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Not a draft' })
  async deleteDrawing(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Param('drawingId', ParseIntPipe) drawingId: number,
  ): Promise<void> {
    await this.uploads.deleteDrawing(session, slug, number, drawingId);
  }

  @Post(`${REVISION}/attachments`)
  @UseInterceptors(SingleFileUpload('attachment', ATTACHMENT_MAX_BYTES))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ type: UploadAttachmentDto })
  @ApiCreatedResponse({ type: AttachmentDto, description: 'Stored' })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: '`attachment_kind_refused` or `file_missing`' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`duplicate_attachment` (same SHA-256), or not a draft' })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto, description: `Larger than ${ATTACHMENT_MAX_BYTES} bytes` })
  @ApiServiceUnavailableResponse({ type: ApiErrorDto, description: 'The file store is down; nothing was kept' })
  async uploadAttachment(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @UploadedFile() file: ReceivedFile | undefined,
    @Body() form: UploadAttachmentDto,
  ): Promise<AttachmentDto> {
    const attachment = await this.uploads.uploadAttachment(session, slug, number, fileOf(file), form.description);
    return toAttachmentDto(attachment, slug, number);
  }

  @Delete(`${REVISION}/attachments/:attachmentId`)
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The attachment and its file are gone' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Not a draft' })
  async deleteAttachment(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Param('attachmentId', ParseIntPipe) attachmentId: number,
  ): Promise<void> {
    await this.uploads.deleteAttachment(session, slug, number, attachmentId);
  }

  @Public()
  @UseGuards(OptionalSessionGuard)
  @Get(`${REVISION}/attachments/:attachmentId`)
  @ApiOkResponse({ description: 'The file, streamed from the store, as a download under its name' })
  @ApiServiceUnavailableResponse({ type: ApiErrorDto, description: 'The file store is down' })
  async download(
    @Req() request: Request,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Param('attachmentId', ParseIntPipe) attachmentId: number,
  ): Promise<StreamableFile> {
    const { attachment, body } = await this.uploads.download(viewerOf(request), slug, number, attachmentId);
    return new StreamableFile(body, {
      type: isTextMediaType(attachment.mediaType) ? `${attachment.mediaType}; charset=utf-8` : attachment.mediaType,
      length: attachment.size,
      disposition: contentDisposition(attachment.name),
    });
  }
}
