import {
  BadRequestException,
  type CallHandler,
  type ExecutionContext,
  HttpException,
  type NestInterceptor,
  PayloadTooLargeException,
  type Type,
  mixin,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import type { Observable } from 'rxjs';

function sizeText(bytes: number): string {
  return bytes % (1024 * 1024) === 0
    ? `${bytes / (1024 * 1024)} MB`
    : `${Math.ceil(bytes / 1024)} kB`;
}

/** Multer's errors as clear 4xx answers (multer's own are terse, and a 500 for some). */
function uploadError(error: unknown, field: string, maxBytes: number): HttpException {
  if (error instanceof MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE':
        return new PayloadTooLargeException(
          `The file is larger than the ${sizeText(maxBytes)} limit.`,
        );
      case 'LIMIT_FILE_COUNT':
      case 'LIMIT_UNEXPECTED_FILE':
        return new BadRequestException(`Send one file, in the form field "${field}".`);
      default:
        return new BadRequestException('The upload has more parts than a single file needs.');
    }
  }
  return new BadRequestException('The upload could not be read as multipart/form-data.');
}

/**
 * Reads one file from a multipart/form-data request into memory (req.file), with hard limits
 * (multer's defaults are unlimited). Runs after the guards, so only allowed users' uploads are
 * read. A request that is not multipart passes through without a file.
 */
export function SingleFileUploadInterceptor(
  field: string,
  maxBytes: number,
): Type<NestInterceptor> {
  class SingleFileUpload implements NestInterceptor {
    private readonly upload = multer({
      storage: multer.memoryStorage(),
      limits: {
        fileSize: maxBytes,
        files: 1,
        fields: 4,
        parts: 5,
        fieldSize: 1024,
        fieldNameSize: 100,
        headerPairs: 50,
      },
    }).single(field);

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      const request = http.getRequest<Request>();
      const response = http.getResponse<Response>();
      await new Promise<void>((resolve, reject) => {
        this.upload(request, response, (error?: unknown) =>
          error ? reject(uploadError(error, field, maxBytes)) : resolve(),
        );
      });
      return next.handle();
    }
  }
  return mixin(SingleFileUpload);
}
