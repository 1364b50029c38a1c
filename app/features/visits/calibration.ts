// Calibration checks on a visit's instruments: a warning, never a refusal, when a calibration
// is more than a year older than the visit, or dated after it (a typing slip, or a probe
// recalibrated since: either way the reading's traceability needs a look).
import { formatDate } from "~/lib/dates";

type Instrument = { probe: string; serial: string; calibrationDate: string | null };

/** The date one calendar year after a YYYY-MM-DD date (29 Feb → 1 Mar of a common year). */
export function oneYearAfter(isoDay: string): string {
  const d = new Date(`${isoDay}T00:00:00Z`);
  d.setUTCFullYear(d.getUTCFullYear() + 1);
  return d.toISOString().slice(0, 10);
}

export type CalibrationWarning = { index: number; message: string };

/** One warning per instrument whose calibration date is after the visit or more than a year before it. */
export function calibrationWarnings(visitedOn: string, instruments: Instrument[]): CalibrationWarning[] {
  const warnings: CalibrationWarning[] = [];
  instruments.forEach((instrument, index) => {
    const { calibrationDate: cal } = instrument;
    const name = [instrument.probe, instrument.serial && `serial ${instrument.serial}`].filter(Boolean).join(", ");
    if (!cal) {
      warnings.push({ index, message: `${name}: no calibration date recorded.` });
    } else if (cal > visitedOn) {
      warnings.push({ index, message: `${name}: calibrated on ${formatDate(cal)}, after the visit on ${formatDate(visitedOn)}. Check the date.` });
    } else if (oneYearAfter(cal) < visitedOn) {
      warnings.push({ index, message: `${name}: calibrated on ${formatDate(cal)}, more than a year before the visit on ${formatDate(visitedOn)}.` });
    }
  });
  return warnings;
}
