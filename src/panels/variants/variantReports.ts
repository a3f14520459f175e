import { evaluate, type Report } from '../../engine';
import type { VariantDesign } from '../../model/design';

/** Reports of shelved variants, kept as long as their design object lives (designs are immutable). */
const cache = new WeakMap<VariantDesign, Report>();

export function variantReport(design: VariantDesign): Report {
  let report = cache.get(design);
  if (!report) {
    report = evaluate(design);
    cache.set(design, report);
  }
  return report;
}
