import { ConflictException } from '@nestjs/common';

/** 409: the chosen time is taken or no longer offered; `nextStarts` are free ones after it. */
export class TimeTakenException extends ConflictException {
  constructor(
    message: string,
    readonly nextStarts: unknown[],
  ) {
    super(message);
  }
}
