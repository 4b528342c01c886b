// The printed/served form of an exposure: everything but the bookkeeping integral.
import type { Exposure, ExposureReport } from './types';

export function toExposureReport(exposure: Exposure): ExposureReport {
  const { integralCH: _integral, ...report } = exposure;
  return report;
}
