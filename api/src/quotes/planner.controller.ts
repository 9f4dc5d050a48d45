import { Body, Controller, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ComputesOnly } from '../common/decorators/computes-only.decorator';
import { Public } from '../common/decorators/public.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { PlannerOptionsDto } from './dto/planner-options.dto';
import { PlannerOptionsResponse } from './dto/planner-options.response';
import { PlannerService } from './planner.service';

@ApiTags('planner')
@Controller('planner')
export class PlannerController {
  constructor(private readonly planner: PlannerService) {}

  @Public()
  @ComputesOnly()
  @Post('options')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      'The products of one kind made for the vehicle, each checked in the current package (best verdict first, then price)',
  })
  @ApiOkResponse({ type: PlannerOptionsResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors such as "items[2].productId"',
    type: ErrorResponse,
  })
  options(@Body() dto: PlannerOptionsDto): Promise<PlannerOptionsResponse> {
    return this.planner.options(dto);
  }
}
