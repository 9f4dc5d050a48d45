import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Query,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles, SignedIn } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import { User } from '../users/entities/user.entity';
import { CreateUploadDto } from './dto/create-upload.dto';
import { UploadQueryDto } from './dto/upload-query.dto';
import { UploadListResponse, UploadResponse } from './dto/upload.response';
import { PHOTO_FIELD, PhotoUploadInterceptor } from './photo-upload.interceptor';
import { MIME_TYPES } from './photo-processing';
import { UPLOAD_KINDS } from './upload-kinds';
import { type PhotoFile, UploadsService } from './uploads.service';

const BINARY = { schema: { type: 'string', format: 'binary' } } as const;

/** The image answer types in the document; error answers stay application/json. */
function imageContent(types: readonly string[]) {
  return Object.fromEntries(types.map((type) => [type, BINARY]));
}

/** The bytes with headers that keep the browser from reading them as anything but an image. */
function send(response: Response, file: PhotoFile): StreamableFile {
  response.setHeader('X-Content-Type-Options', 'nosniff');
  // Replaces the API's no-store: the photo never changes, but only the signed-in browser keeps it.
  response.setHeader('Cache-Control', 'private, max-age=300');
  return new StreamableFile(file.stream, {
    type: file.contentType,
    disposition: 'inline',
    length: file.bytes,
  });
}

@ApiTags('uploads')
@Controller('uploads')
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  @Roles('customer', 'desk', 'manager')
  @Post()
  @UseInterceptors(PhotoUploadInterceptor)
  @ApiOperation({
    summary:
      'Upload a photo (vehicle or tyre placard): checked by its content, stored re-encoded without metadata, with a thumbnail',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: [PHOTO_FIELD, 'kind'],
      properties: {
        [PHOTO_FIELD]: {
          type: 'string',
          format: 'binary',
          description: 'A JPEG, PNG or WebP photo, at most 10 MB and 40 megapixels',
        },
        kind: { type: 'string', enum: [...UPLOAD_KINDS] },
      },
    },
  })
  @ApiCreatedResponse({ type: UploadResponse })
  @ApiBadRequestResponse({
    description:
      'No photo, not a JPEG/PNG/WebP image by content, too many pixels, a bad kind, or 20 photos already waiting for a quote',
    type: ErrorResponse,
  })
  @ApiPayloadTooLargeResponse({ description: 'Over 10 MB; nothing stored', type: ErrorResponse })
  create(
    @CurrentUser() user: User,
    @Body() dto: CreateUploadDto,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<UploadResponse> {
    return this.uploads.create(user, dto.kind, file);
  }

  @Roles('customer', 'desk', 'manager')
  @Get()
  @ApiOperation({ summary: "The caller's own photos, newest first (at most 200)" })
  @ApiOkResponse({ type: UploadListResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  list(@CurrentUser() user: User, @Query() query: UploadQueryDto): Promise<UploadListResponse> {
    return this.uploads.list(user, query.quoteId);
  }

  @SignedIn()
  @Get(':id')
  @ApiOperation({
    summary: "The photo, for its owner or staff (another customer's photo is 404)",
  })
  @ApiOkResponse({
    description: 'The stored photo in its own format',
    content: imageContent(Object.values(MIME_TYPES)),
  })
  @ApiNotFoundResponse({ type: ErrorResponse })
  async original(
    @CurrentUser() user: User,
    @Param() params: IdParams,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return send(response, await this.uploads.file(user, params.id, 'original'));
  }

  @SignedIn()
  @Get(':id/thumbnail')
  @ApiOperation({
    summary: "The photo's WebP thumbnail (at most 320 px), for its owner or staff",
  })
  @ApiOkResponse({ description: 'WebP thumbnail', content: imageContent([MIME_TYPES.webp]) })
  @ApiNotFoundResponse({ type: ErrorResponse })
  async thumbnail(
    @CurrentUser() user: User,
    @Param() params: IdParams,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return send(response, await this.uploads.file(user, params.id, 'thumbnail'));
  }

  @Roles('customer', 'desk', 'manager')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'Remove one of my photos that is not on a quote (files removed)' })
  @ApiNoContentResponse({ description: 'Removed' })
  @ApiNotFoundResponse({ description: 'Not one of my photos', type: ErrorResponse })
  @ApiConflictResponse({ description: 'The photo is on a saved quote', type: ErrorResponse })
  async remove(@CurrentUser() user: User, @Param() params: IdParams): Promise<void> {
    await this.uploads.remove(user, params.id);
  }
}
