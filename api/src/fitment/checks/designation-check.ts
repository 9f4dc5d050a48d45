/** Reports tyre designations that could not be read; the checks that need them are skipped. */
import type { FitmentContext } from '../fitment-context';
import type { CheckOutcome } from '../fitment.types';

export const DESIGNATION_RULE_SOURCE = 'ISO 4000-1 / ETRTO tyre size designation (H).';

/**
 * Null when every designation was read. A new tyre that cannot be read does not fit (nothing
 * about it can be confirmed); unreadable vehicle data is an advisory for the workshop to fix.
 */
export function checkTyreDesignations(context: FitmentContext): CheckOutcome | null {
  if (context.designationProblems.length === 0) return null;
  const newTyreUnreadable = context.designationProblems.some(
    (problem) => problem.which === 'new tyre',
  );
  const details = context.designationProblems
    .map((problem) => `the ${problem.which} "${problem.designation}" (${problem.error.message})`)
    .join('; ');
  return {
    ran: true,
    check: {
      code: 'tyre-designation',
      verdict: newTyreUnreadable ? 'does-not-fit' : 'advisory',
      message: newTyreUnreadable
        ? `The tyre size could not be read, so the tyre cannot be checked: ${details}.`
        : `Some of the vehicle's tyre data could not be read, so the checks that need it were skipped: ${details}. The workshop will correct the vehicle record.`,
      numbers: {},
      rule: { source: DESIGNATION_RULE_SOURCE, keys: [] },
    },
    additions: [],
  };
}
