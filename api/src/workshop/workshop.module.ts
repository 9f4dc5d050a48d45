import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { Bay } from './entities/bay.entity';
import { Closure } from './entities/closure.entity';
import { HolidayOverride } from './entities/holiday-override.entity';
import { OpeningHours } from './entities/opening-hours.entity';
import { Workshop } from './entities/workshop.entity';
import { WorkshopSetupController } from './workshop-setup.controller';
import { WorkshopSetupService } from './workshop-setup.service';
import { WorkshopController } from './workshop.controller';
import { WorkshopService } from './workshop.service';

@Module({
  imports: [MikroOrmModule.forFeature([Workshop, Bay, OpeningHours, Closure, HolidayOverride])],
  controllers: [WorkshopController, WorkshopSetupController],
  providers: [WorkshopService, WorkshopSetupService],
  exports: [WorkshopService, WorkshopSetupService],
})
export class WorkshopModule {}
