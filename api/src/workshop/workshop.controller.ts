import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { PolicyResponse } from './dto/policy.response';
import { UpdatePolicyDto } from './dto/update-policy.dto';
import { WorkshopCardResponse } from './dto/workshop-card.response';
import { WorkshopService } from './workshop.service';

@ApiTags('workshop')
@Controller()
export class WorkshopController {
  constructor(private readonly workshop: WorkshopService) {}

  @Public()
  @Get('workshop')
  @ApiOperation({ summary: "The workshop's card: name, address, phone, e-mail, time zone" })
  @ApiOkResponse({ type: WorkshopCardResponse })
  card(): Promise<WorkshopCardResponse> {
    return this.workshop.card();
  }

  @Roles('manager', 'desk')
  @Get('policies')
  @ApiOperation({
    summary: 'The pricing policy: labour rate, GST, charges, bundle discount, deposit',
  })
  @ApiOkResponse({ type: PolicyResponse })
  policy(): Promise<PolicyResponse> {
    return this.workshop.policy();
  }

  @Roles('manager')
  @Put('policies')
  @ApiOperation({
    summary: 'Replace the pricing policy (saved quotes keep the prices they were given)',
  })
  @ApiOkResponse({ type: PolicyResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors such as "deposit.capCents"; nothing changed',
    type: ErrorResponse,
  })
  updatePolicy(@Body() dto: UpdatePolicyDto): Promise<PolicyResponse> {
    return this.workshop.updatePolicy(dto);
  }
}
