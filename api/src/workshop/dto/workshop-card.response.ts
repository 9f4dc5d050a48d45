import { ApiProperty } from '@nestjs/swagger';
import type { Workshop } from '../entities/workshop.entity';

/** What a quote, its PDF and the home page show about the shop. */
export class WorkshopCardResponse {
  @ApiProperty({ example: 'Kestrelmere 4x4 & Tyre' })
  name!: string;

  @ApiProperty({ example: '7 Quarry Flat Road' })
  addressLine!: string;

  @ApiProperty({ example: 'Tallowgate' })
  town!: string;

  @ApiProperty({ example: '0491 570 006' })
  phone!: string;

  @ApiProperty({ example: 'bookings@kestrelmere.example' })
  email!: string;

  @ApiProperty({ example: 'Australia/Sydney', description: 'IANA time zone of the workshop' })
  timeZone!: string;

  @ApiProperty({ example: 'AUD', description: 'ISO 4217 currency code' })
  currency!: string;

  static from(workshop: Workshop): WorkshopCardResponse {
    return Object.assign(new WorkshopCardResponse(), {
      name: workshop.name,
      addressLine: workshop.addressLine,
      town: workshop.town,
      phone: workshop.phone,
      email: workshop.email,
      timeZone: workshop.timeZone,
      currency: workshop.currency,
    });
  }
}
