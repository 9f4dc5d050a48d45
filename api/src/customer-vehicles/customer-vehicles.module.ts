import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { CustomerVehiclesController } from './customer-vehicles.controller';
import { CustomerVehiclesService } from './customer-vehicles.service';
import { CustomerVehicle } from './entities/customer-vehicle.entity';

@Module({
  imports: [MikroOrmModule.forFeature([CustomerVehicle, VehicleModel])],
  controllers: [CustomerVehiclesController],
  providers: [CustomerVehiclesService],
})
export class CustomerVehiclesModule {}
