import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Query,
  StreamableFile,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, OptionalCurrentUser } from '../common/decorators/current-user.decorator';
import { ComputesOnly } from '../common/decorators/computes-only.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import type { User } from '../users/entities/user.entity';
import { CreateQuoteDto } from './dto/create-quote.dto';
import { QuoteListQueryDto } from './dto/quote-list-query.dto';
import { QuotePackageDto } from './dto/quote-package.dto';
import { QuotePreviewResponse } from './dto/quote-preview.response';
import { QuoteListResponse } from './dto/quote-summary.response';
import { QuoteVersionParams } from './dto/quote-version.params';
import { QuoteResponse } from './dto/quote.response';
import { QuotesService } from './quotes.service';
import { RevisionPreviewDto, ReviseQuoteDto } from './dto/revise-quote.dto';
import { QuoteRevisionsService } from './quote-revisions.service';

@ApiTags('quotes')
@Controller('quotes')
export class QuotesController {
  constructor(
    private readonly quotes: QuotesService,
    private readonly revisions: QuoteRevisionsService,
  ) {}

  @Public()
  @ComputesOnly()
  @Post('preview')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary: 'Price and fit-check a package as it would be saved now (writes nothing)',
  })
  @ApiOkResponse({ type: QuotePreviewResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors such as "items[2].productId"',
    type: ErrorResponse,
  })
  preview(
    @Body() dto: QuotePackageDto,
    @OptionalCurrentUser() user: User | null,
  ): Promise<QuotePreviewResponse> {
    return this.quotes.preview(dto, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post()
  @ApiOperation({
    summary:
      'Save the package as a quote (version 1: sent when the customer saves it, a draft when the desk does)',
  })
  @ApiCreatedResponse({ type: QuoteResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors; a package that does not fit is refused with fieldErrors.items',
    type: ErrorResponse,
  })
  create(@Body() dto: CreateQuoteDto, @CurrentUser() user: User): Promise<QuoteResponse> {
    return this.quotes.create(dto, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Get()
  @ApiOperation({
    summary: "Quotes, newest first (a customer's own; every quote for the desk), at most 200",
  })
  @ApiOkResponse({ type: QuoteListResponse })
  list(@Query() query: QuoteListQueryDto, @CurrentUser() user: User): Promise<QuoteListResponse> {
    return this.quotes.list(query, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Get(':id')
  @ApiOperation({ summary: "One quote with every version (another customer's is 404)" })
  @ApiOkResponse({ type: QuoteResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  get(@Param() params: IdParams, @CurrentUser() user: User): Promise<QuoteResponse> {
    return this.quotes.get(params.id, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Get(':id/versions/:n/pdf')
  @ApiOperation({ summary: 'The quote version as a PDF' })
  @ApiProduces('application/pdf')
  @ApiOkResponse({ schema: { type: 'string', format: 'binary' } })
  @ApiNotFoundResponse({ type: ErrorResponse })
  async pdf(
    @Param() params: QuoteVersionParams,
    @CurrentUser() user: User,
  ): Promise<StreamableFile> {
    const { fileName, bytes } = await this.quotes.pdf(params.id, params.n, user);
    return new StreamableFile(bytes, {
      type: 'application/pdf',
      disposition: `inline; filename="${fileName}"`,
      length: bytes.length,
    });
  }

  @Roles('customer')
  @Post(':id/versions/:n/accept')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Accept the latest sent version of my quote' })
  @ApiOkResponse({ type: QuoteResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Expired, superseded, declined, already accepted or not the latest',
    type: ErrorResponse,
  })
  accept(@Param() params: QuoteVersionParams, @CurrentUser() user: User): Promise<QuoteResponse> {
    return this.quotes.answer(params.id, params.n, user, 'accepted');
  }

  @Roles('customer')
  @Post(':id/versions/:n/decline')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Decline the latest sent version of my quote' })
  @ApiOkResponse({ type: QuoteResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({ type: ErrorResponse })
  decline(@Param() params: QuoteVersionParams, @CurrentUser() user: User): Promise<QuoteResponse> {
    return this.quotes.answer(params.id, params.n, user, 'declined');
  }

  @Roles('desk', 'manager')
  @Post(':id/versions/:n/send')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Send a draft version to the customer' })
  @ApiOkResponse({ type: QuoteResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Not a draft, expired or not the latest',
    type: ErrorResponse,
  })
  send(@Param() params: QuoteVersionParams, @CurrentUser() user: User): Promise<QuoteResponse> {
    return this.quotes.send(params.id, params.n, user);
  }

  @Roles('desk', 'manager')
  @Post(':id/revisions/preview')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      'Price and fit-check a revision of the quote (parts, quantities, labour per line, a workshop discount); writes nothing',
  })
  @ApiOkResponse({ type: QuotePreviewResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  previewRevision(
    @Param() params: IdParams,
    @Body() dto: RevisionPreviewDto,
    @CurrentUser() user: User,
  ): Promise<QuotePreviewResponse> {
    return this.revisions.preview(params.id, dto, user);
  }

  @Roles('desk', 'manager')
  @Post(':id/revisions')
  @ApiOperation({
    summary:
      'Save a revision as the next version, sent to the customer with the reason (the version before is superseded); the customer is e-mailed the PDF and a link to compare and answer',
  })
  @ApiCreatedResponse({ type: QuoteResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors; a package that does not fit is refused with fieldErrors.items',
    type: ErrorResponse,
  })
  @ApiNotFoundResponse({ type: ErrorResponse })
  revise(
    @Param() params: IdParams,
    @Body() dto: ReviseQuoteDto,
    @CurrentUser() user: User,
  ): Promise<QuoteResponse> {
    return this.revisions.revise(params.id, dto, user);
  }
}
