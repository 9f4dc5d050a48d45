import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { NotificationsModule } from '../notifications/notifications.module';
import { PaymentsModule } from '../payments/payments.module';
import { QuotesModule } from '../quotes/quotes.module';
import { WorkshopModule } from '../workshop/workshop.module';
import { AvailabilityService } from './availability.service';
import { BookingsController } from './bookings.controller';
import { BookingsService } from './bookings.service';
import { BookingEvent } from './entities/booking-event.entity';
import { Booking } from './entities/booking.entity';
import { Reservation } from './entities/reservation.entity';
import { HoldSweeperService } from './hold-sweeper.service';
import { ReminderSweeperService } from './reminder-sweeper.service';

@Module({
  imports: [
    MikroOrmModule.forFeature([Booking, BookingEvent, Reservation]),
    QuotesModule,
    WorkshopModule,
    PaymentsModule,
    NotificationsModule,
  ],
  controllers: [BookingsController],
  providers: [BookingsService, AvailabilityService, HoldSweeperService, ReminderSweeperService],
  exports: [BookingsService, AvailabilityService, HoldSweeperService, ReminderSweeperService],
})
export class BookingsModule {}
