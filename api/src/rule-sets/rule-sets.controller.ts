import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiExtraModels,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import { RuleLimitResponse, RuleSetListResponse, RuleSetResponse } from './dto/rule-set.response';
import { RuleLimitPatch, UpdateRuleSetDto } from './dto/update-rule-set.dto';
import { RuleSetsService } from './rule-sets.service';

@ApiTags('rule sets')
@ApiExtraModels(RuleLimitResponse, RuleLimitPatch)
@Controller('rule-sets')
export class RuleSetsController {
  constructor(private readonly ruleSets: RuleSetsService) {}

  @Roles('manager', 'desk')
  @Get()
  @ApiOperation({ summary: 'Every rule set (modification limits per jurisdiction), default first' })
  @ApiOkResponse({ type: RuleSetListResponse })
  list(): Promise<RuleSetListResponse> {
    return this.ruleSets.list();
  }

  @Roles('manager', 'desk')
  @Get(':id')
  @ApiOperation({ summary: 'One rule set' })
  @ApiOkResponse({ type: RuleSetResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  get(@Param() params: IdParams): Promise<RuleSetResponse> {
    return this.ruleSets.get(params.id);
  }

  @Roles('manager')
  @Patch(':id')
  @ApiOperation({
    summary: 'Switch rules on or off and change their values (each keeps its source)',
  })
  @ApiOkResponse({ type: RuleSetResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors "limits.<key>.value"; nothing changed',
    type: ErrorResponse,
  })
  @ApiNotFoundResponse({ type: ErrorResponse })
  update(@Param() params: IdParams, @Body() dto: UpdateRuleSetDto): Promise<RuleSetResponse> {
    return this.ruleSets.update(params.id, dto);
  }
}
