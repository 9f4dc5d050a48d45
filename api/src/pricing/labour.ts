/**
 * Labour: minutes × hourly rate ÷ 60, rounded half-up to the cent on each labour line (the
 * same half-a-cent-up rule s 9-90 sets for GST; for labour it is Liftwright's policy).
 */
import { type Cents, assertWholeNumber, multiplyDivideRoundHalfUp } from './cents';

export const MINUTES_PER_HOUR = 60;

/** The charge for some minutes of labour at an hourly rate, rounded half-up to the cent. */
export function labourCents(labourMinutes: number, labourRateCentsPerHour: Cents): Cents {
  assertWholeNumber(labourMinutes, 'labourMinutes');
  return multiplyDivideRoundHalfUp(labourMinutes, labourRateCentsPerHour, MINUTES_PER_HOUR);
}
