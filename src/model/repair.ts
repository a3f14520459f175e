// Repair domains and the settings' type, without the validation library; the settings' schema is in
// repairSchema.ts, loaded with restore and the edit check.

export type { RepairSettings } from './repairSchema';

/** Which mats share one pool of spare rows (spare columns are per sense-amplifier strip segment). */
export const REPAIR_DOMAINS = ['mat', 'matRow', 'bank'] as const;
export type RepairDomainKind = (typeof REPAIR_DOMAINS)[number];

export const REPAIR_DOMAIN_LABEL: Readonly<Record<RepairDomainKind, string>> = {
  mat: 'each mat',
  matRow: 'each mat row (mats along one word-line band)',
  bank: 'the whole floorplan',
};
