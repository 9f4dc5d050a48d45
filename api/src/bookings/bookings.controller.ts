import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post, Query } from '@nestjs/common';
import {
  ApiBadGatewayResponse,
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import type { User } from '../users/entities/user.entity';
import { BookingsService } from './bookings.service';
import { AvailabilityResponse, BookingConflictResponse } from './dto/availability.response';
import {
  AdvanceBookingDto,
  AvailabilityQueryDto,
  CreateBookingDto,
  MoveBookingDto,
  MoveRequestDto,
} from './dto/booking-requests.dto';
import {
  BookingListResponse,
  BookingResponse,
  DepositCheckoutResponse,
} from './dto/booking.response';

@ApiTags('bookings')
@Controller()
export class BookingsController {
  constructor(private readonly bookings: BookingsService) {}

  @Roles('customer', 'desk', 'manager')
  @Get('availability')
  @ApiOperation({
    summary:
      'Start times that fit a quote version: per day, each with its bay segments (workshop zone and UTC)',
  })
  @ApiOkResponse({ type: AvailabilityResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'The version cannot be booked (expired, replaced…)',
    type: ErrorResponse,
  })
  availability(
    @Query() query: AvailabilityQueryDto,
    @CurrentUser() user: User,
  ): Promise<AvailabilityResponse> {
    return this.bookings.findAvailability(query, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post('bookings')
  @ApiOperation({
    summary: 'Hold a start time for a quote version (state held, until holdExpiresAt)',
  })
  @ApiCreatedResponse({ type: BookingResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Taken or not offered: nextStarts',
    type: BookingConflictResponse,
  })
  hold(@Body() dto: CreateBookingDto, @CurrentUser() user: User): Promise<BookingResponse> {
    return this.bookings.hold(dto, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Get('bookings')
  @ApiOperation({
    summary: "Bookings, newest first (a customer's own; every booking for the desk)",
  })
  @ApiOkResponse({ type: BookingListResponse })
  list(@CurrentUser() user: User): Promise<BookingListResponse> {
    return this.bookings.list(user);
  }

  @Roles('customer', 'desk', 'manager')
  @Get('bookings/:id')
  @ApiOperation({ summary: "One booking (another customer's is 404)" })
  @ApiOkResponse({ type: BookingResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  get(@Param() params: IdParams, @CurrentUser() user: User): Promise<BookingResponse> {
    return this.bookings.get(params.id, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post('bookings/:id/move')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      'Move to another start: all reservations at once or nothing (the customer while held; the desk while held, requested or confirmed)',
  })
  @ApiOkResponse({ type: BookingResponse })
  @ApiConflictResponse({
    description: 'Taken or not offered: nextStarts',
    type: BookingConflictResponse,
  })
  move(
    @Param() params: IdParams,
    @Body() dto: MoveBookingDto,
    @CurrentUser() user: User,
  ): Promise<BookingResponse> {
    return this.bookings.move(params.id, dto, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post('bookings/:id/cancel')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      'Cancel (or release a hold): the bays are freed; a paid deposit is refunded as the cancellation policy allows',
  })
  @ApiOkResponse({ type: BookingResponse })
  @ApiConflictResponse({ type: ErrorResponse })
  @ApiBadGatewayResponse({
    description: 'The refund could not be made: nothing changed',
    type: ErrorResponse,
  })
  cancel(@Param() params: IdParams, @CurrentUser() user: User): Promise<BookingResponse> {
    return this.bookings.cancel(params.id, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post('bookings/:id/deposit-checkout')
  @ApiOperation({
    summary:
      "The payment page for a held booking's deposit (the open one again, or a new one); the hold lasts until the page expires",
  })
  @ApiCreatedResponse({ type: DepositCheckoutResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Not held, the hold has run out, or the deposit is already paid',
    type: ErrorResponse,
  })
  @ApiBadGatewayResponse({
    description: 'The payment provider cannot be reached: nothing changed',
    type: ErrorResponse,
  })
  depositCheckout(
    @Param() params: IdParams,
    @CurrentUser() user: User,
  ): Promise<DepositCheckoutResponse> {
    return this.bookings.depositCheckout(params.id, user);
  }

  @Roles('customer', 'desk', 'manager')
  @Post('bookings/:id/top-up-checkout')
  @ApiOperation({
    summary:
      'The payment page for the difference when an accepted revision raised the deposit (requested or confirmed bookings)',
  })
  @ApiCreatedResponse({ type: DepositCheckoutResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Nothing is due, or the booking is not requested or confirmed',
    type: ErrorResponse,
  })
  @ApiBadGatewayResponse({
    description: 'The payment provider cannot be reached: nothing changed',
    type: ErrorResponse,
  })
  topUpCheckout(
    @Param() params: IdParams,
    @CurrentUser() user: User,
  ): Promise<DepositCheckoutResponse> {
    return this.bookings.topUpCheckout(params.id, user);
  }

  @Roles('desk', 'manager')
  @Post('bookings/:id/advance')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      'The desk moves a booking on: requested → confirmed, confirmed → in-progress (vehicle in), in-progress → completed',
  })
  @ApiOkResponse({ type: BookingResponse })
  @ApiConflictResponse({ description: 'Not the state this step starts from', type: ErrorResponse })
  advance(
    @Param() params: IdParams,
    @Body() dto: AdvanceBookingDto,
    @CurrentUser() user: User,
  ): Promise<BookingResponse> {
    return this.bookings.advance(params.id, dto, user);
  }

  @Roles('desk', 'manager')
  @Post('bookings/:id/arrived')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary: 'Mark the vehicle as arrived (on site) on a requested or confirmed booking',
  })
  @ApiOkResponse({ type: BookingResponse })
  @ApiConflictResponse({
    description: 'Already marked in, or not requested or confirmed',
    type: ErrorResponse,
  })
  markArrived(@Param() params: IdParams, @CurrentUser() user: User): Promise<BookingResponse> {
    return this.bookings.markArrived(params.id, user);
  }

  @Roles('customer')
  @Post('bookings/:id/move-request')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Ask the workshop to move a requested or confirmed booking' })
  @ApiOkResponse({ type: BookingResponse })
  @ApiConflictResponse({ type: ErrorResponse })
  requestMove(
    @Param() params: IdParams,
    @Body() dto: MoveRequestDto,
    @CurrentUser() user: User,
  ): Promise<BookingResponse> {
    return this.bookings.requestMove(params.id, dto, user);
  }
}
