import type { PackagePrice } from '../pricing/pricing.types';
import type { JobPartItem, JobPlanInput, JobWorkItem } from '../scheduling/scheduling.types';

export interface JobPlanSettings {
  fittingMinutesPerWheel: number;
  leadTimeBufferDays: number;
}

/**
 * The scheduling engine's input from a saved quote version: the bay time of its labour and
 * service lines, fitting and balancing per wheel fitted (the policy prices it; the workshop's
 * calendar says how long it takes, in the tyre bay), and the lead times of its parts.
 */
export function jobPlanInputOf(
  version: { price: PackagePrice; wheelsFitted: number },
  settings: JobPlanSettings,
  todayLocalDate: string,
): JobPlanInput {
  const work: JobWorkItem[] = [];
  const parts: JobPartItem[] = [];
  for (const line of version.price.lines) {
    switch (line.kind) {
      case 'labour':
        work.push({
          bayKind: line.bayKind,
          minutes: line.labourMinutes,
          description: line.description,
        });
        break;
      case 'service':
        work.push({
          bayKind: line.bayKind,
          minutes: line.bayMinutes,
          description: line.description,
        });
        break;
      case 'part':
        parts.push({
          description: line.description,
          specialOrder: line.specialOrder,
          leadDays: line.leadDays,
        });
        break;
      default:
        break;
    }
  }
  if (version.wheelsFitted > 0 && settings.fittingMinutesPerWheel > 0) {
    work.push({
      bayKind: 'tyre',
      minutes: version.wheelsFitted * settings.fittingMinutesPerWheel,
      description: `Fitting and balancing, ${version.wheelsFitted} ${version.wheelsFitted === 1 ? 'wheel' : 'wheels'}`,
    });
  }
  return { work, parts, leadTimeBufferDays: settings.leadTimeBufferDays, todayLocalDate };
}
