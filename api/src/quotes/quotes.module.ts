import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { NotificationsModule } from '../notifications/notifications.module';
import { Product } from '../catalogue/entities/product.entity';
import { CustomerVehicle } from '../customer-vehicles/entities/customer-vehicle.entity';
import { FitReportsModule } from '../fit-reports/fit-reports.module';
import { Upload } from '../uploads/entities/upload.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { WorkshopModule } from '../workshop/workshop.module';
import { QuoteLine } from './entities/quote-line.entity';
import { QuoteVersion } from './entities/quote-version.entity';
import { Quote } from './entities/quote.entity';
import { PlannerController } from './planner.controller';
import { PlannerService } from './planner.service';
import { QuotePackagesService } from './quote-packages.service';
import { QuotesController } from './quotes.controller';
import { CatalogueSnapshotService } from './catalogue-snapshot.service';
import { PackageDataLoader } from './package-data.loader';
import { QuotesService } from './quotes.service';
import { QuoteHooks } from './quote-hooks';
import { QuoteRevisionsService } from './quote-revisions.service';

@Module({
  imports: [
    MikroOrmModule.forFeature([
      Quote,
      QuoteVersion,
      QuoteLine,
      Product,
      VehicleModel,
      CustomerVehicle,
      Upload,
    ]),
    FitReportsModule,
    WorkshopModule,
    NotificationsModule,
  ],
  controllers: [QuotesController, PlannerController],
  providers: [
    QuotesService,
    QuotePackagesService,
    PlannerService,
    PackageDataLoader,
    CatalogueSnapshotService,
    QuoteRevisionsService,
    QuoteHooks,
  ],
  exports: [QuotesService, QuoteHooks],
})
export class QuotesModule {}
