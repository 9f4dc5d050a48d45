import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { RuleSet } from './entities/rule-set.entity';
import { RuleSetsController } from './rule-sets.controller';
import { RuleSetsService } from './rule-sets.service';

@Module({
  imports: [MikroOrmModule.forFeature([RuleSet])],
  controllers: [RuleSetsController],
  providers: [RuleSetsService],
  exports: [RuleSetsService],
})
export class RuleSetsModule {}
