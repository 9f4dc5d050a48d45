import {
  BadRequestException,
  type CallHandler,
  type ExecutionContext,
  HttpException,
  HttpStatus,
  Injectable,
  type NestInterceptor,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import type { Observable } from 'rxjs';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { MAX_UPLOAD_BYTES } from './upload-kinds';

export const PHOTO_FIELD = 'photo';
export const PHOTO_TOO_LARGE_MESSAGE = `The photo is larger than ${MAX_UPLOAD_BYTES / (1024 * 1024)} MB`;

function uploadError(error: unknown): HttpException {
  if (error instanceof MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE':
        return new FieldErrorsException(
          { [PHOTO_FIELD]: [`is larger than ${MAX_UPLOAD_BYTES / (1024 * 1024)} MB`] },
          PHOTO_TOO_LARGE_MESSAGE,
          HttpStatus.PAYLOAD_TOO_LARGE,
        );
      case 'LIMIT_FILE_COUNT':
      case 'LIMIT_UNEXPECTED_FILE':
        return new FieldErrorsException(
          { [PHOTO_FIELD]: [`send one photo, in the form field "${PHOTO_FIELD}"`] },
          `Send one photo, in the form field "${PHOTO_FIELD}".`,
        );
      default:
        return new BadRequestException(
          'The upload has more parts than one photo and its kind need.',
        );
    }
  }
  return new BadRequestException('The upload could not be read as multipart/form-data.');
}

/**
 * Reads the one photo of a multipart/form-data request into memory (req.file), with hard limits
 * (multer's defaults are unlimited): 10 MB, one file, four text fields of at most 1 kB, six
 * parts. Runs after the guards, so only allowed users' uploads are read; nothing touches the
 * disk here. A request that is not multipart passes through without a file.
 */
@Injectable()
export class PhotoUploadInterceptor implements NestInterceptor {
  private readonly upload = multer({
    storage: multer.memoryStorage(),
    // Browsers send UTF-8 file names; busboy would read them as Latin-1.
    defParamCharset: 'utf8',
    limits: {
      fileSize: MAX_UPLOAD_BYTES,
      files: 1,
      fields: 4,
      fieldSize: 1024,
      parts: 6,
      fieldNameSize: 100,
      headerPairs: 50,
    },
  }).single(PHOTO_FIELD);

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    const request = http.getRequest<Request>();
    const response = http.getResponse<Response>();
    await new Promise<void>((resolve, reject) => {
      this.upload(request, response, (error?: unknown) =>
        error ? reject(uploadError(error)) : resolve(),
      );
    });
    return next.handle();
  }
}
