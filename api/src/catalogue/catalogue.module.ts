import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { FitReportsModule } from '../fit-reports/fit-reports.module';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { CatalogueCsvController } from './catalogue-csv.controller';
import { CatalogueImportService } from './catalogue-import.service';
import { Product } from './entities/product.entity';
import { ProductsController } from './products.controller';
import { ProductsService } from './products.service';

@Module({
  imports: [MikroOrmModule.forFeature([Product, VehicleModel]), FitReportsModule],
  controllers: [ProductsController, CatalogueCsvController],
  providers: [ProductsService, CatalogueImportService],
})
export class CatalogueModule {}
