import { Embeddable, Property } from '@mikro-orm/core';

/** The wheel the maker fits: the reference for offset, track and rim checks. */
@Embeddable()
export class StockWheel {
  @Property({ type: 'decimal', precision: 4, scale: 1, runtimeType: 'number' })
  diameterIn: number;

  @Property({ type: 'decimal', precision: 4, scale: 1, runtimeType: 'number' })
  widthIn: number;

  @Property({ type: 'integer' })
  offsetMm: number;

  constructor(diameterIn: number, widthIn: number, offsetMm: number) {
    this.diameterIn = diameterIn;
    this.widthIn = widthIn;
    this.offsetMm = offsetMm;
  }
}
