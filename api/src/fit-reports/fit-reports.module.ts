import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { Product } from '../catalogue/entities/product.entity';
import { RuleSetsModule } from '../rule-sets/rule-sets.module';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { FitReportsController } from './fit-reports.controller';
import { FitReportsService } from './fit-reports.service';

@Module({
  imports: [MikroOrmModule.forFeature([Product, VehicleModel]), RuleSetsModule],
  controllers: [FitReportsController],
  providers: [FitReportsService],
  exports: [FitReportsService],
})
export class FitReportsModule {}
