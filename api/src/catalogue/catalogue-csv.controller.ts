import {
  BadRequestException,
  Controller,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Post,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBody,
  type ApiBodyOptions,
  ApiConsumes,
  ApiExtraModels,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { SingleFileUploadInterceptor } from '../common/interceptors/single-file-upload.interceptor';
import { CatalogueImportService } from './catalogue-import.service';
import { CSV_COLUMNS, CSV_MAX_BYTES } from './catalogue-csv';
import {
  FieldChangeResponse,
  ImportApplyResponse,
  ImportPreviewResponse,
} from './dto/catalogue-import.response';

const FILE_FIELD = 'file';

const UPLOAD_BODY: ApiBodyOptions = {
  schema: {
    type: 'object',
    required: [FILE_FIELD],
    properties: {
      [FILE_FIELD]: {
        type: 'string',
        format: 'binary',
        description: `CSV price list, at most 1 MB, columns ${CSV_COLUMNS.join(',')}`,
      },
    },
  },
};

function contentOf(file: Express.Multer.File | undefined): Buffer {
  if (!file) {
    throw new BadRequestException(
      `Attach the price list as the multipart form field "${FILE_FIELD}".`,
    );
  }
  return file.buffer;
}

@ApiTags('catalogue')
@ApiExtraModels(FieldChangeResponse)
@Controller('catalogue')
export class CatalogueCsvController {
  constructor(private readonly imports: CatalogueImportService) {}

  @Roles('manager')
  @Post('import/preview')
  @HttpCode(HttpStatus.OK)
  @UseInterceptors(SingleFileUploadInterceptor(FILE_FIELD, CSV_MAX_BYTES))
  @ApiOperation({
    summary:
      'What a CSV price list would change (new, updated, unchanged, rejected rows); writes nothing',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOkResponse({ type: ImportPreviewResponse })
  @ApiBadRequestResponse({
    description: 'Not a CSV, missing columns, or no valid row',
    type: ErrorResponse,
  })
  @ApiPayloadTooLargeResponse({ description: 'Over 1 MB', type: ErrorResponse })
  preview(@UploadedFile() file: Express.Multer.File | undefined): Promise<ImportPreviewResponse> {
    return this.imports.preview(contentOf(file));
  }

  @Roles('manager')
  @Post('import/apply')
  @HttpCode(HttpStatus.OK)
  @UseInterceptors(SingleFileUploadInterceptor(FILE_FIELD, CSV_MAX_BYTES))
  @ApiOperation({
    summary:
      'Write every new and updated row in one transaction (rejected rows are skipped and listed)',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOkResponse({ type: ImportApplyResponse })
  @ApiBadRequestResponse({
    description: 'Not a CSV, missing columns, or no valid row; nothing changed',
    type: ErrorResponse,
  })
  @ApiPayloadTooLargeResponse({ description: 'Over 1 MB; nothing changed', type: ErrorResponse })
  apply(@UploadedFile() file: Express.Multer.File | undefined): Promise<ImportApplyResponse> {
    return this.imports.apply(contentOf(file));
  }

  @Roles('manager')
  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="liftwright-catalogue.csv"')
  @ApiOperation({
    summary: 'The whole catalogue as a CSV price list (imports back as all unchanged)',
  })
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' }, description: `Columns ${CSV_COLUMNS.join(',')}` })
  exportCsv(): Promise<string> {
    return this.imports.exportCsv();
  }
}
