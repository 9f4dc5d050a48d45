import { Body, Controller, Get, HttpCode, HttpStatus, Post, Query } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { CheckFitmentDto } from './dto/check-fitment.dto';
import { FitReportResponse } from './dto/fit-report.response';
import { TyreSizeQueryDto, TyreSizeResponse } from './dto/tyre-size.dto';
import { FitReportsService } from './fit-reports.service';

@ApiTags('fitment')
@Controller('fitment')
export class FitReportsController {
  constructor(private readonly fitReports: FitReportsService) {}

  @Public()
  @Get('tyre-size')
  @ApiOperation({ summary: 'Read a tyre designation: the parsed size and its nominal dimensions' })
  @ApiOkResponse({ type: TyreSizeResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors.designation names the wrong part',
    type: ErrorResponse,
  })
  tyreSize(@Query() query: TyreSizeQueryDto): TyreSizeResponse {
    return this.fitReports.tyreSize(query.designation);
  }

  @Public()
  @Post('check')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'The fit report of a package on a vehicle model, against a rule set' })
  @ApiOkResponse({ type: FitReportResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  check(@Body() dto: CheckFitmentDto): Promise<FitReportResponse> {
    return this.fitReports.check(dto);
  }
}
