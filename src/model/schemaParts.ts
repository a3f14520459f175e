import { z } from 'zod';

/**
 * Small zod builders shared by the model schemas. Each bounds a number so that NaN, Infinity and
 * absurd magnitudes are rejected with a message naming the field, instead of flowing into the physics.
 */

export function finite(label: string, min: number, max: number) {
  return z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, { message: `${label} must be a finite number` })
    .refine((v) => v >= min && v <= max, { message: `${label} must lie between ${min} and ${max}` });
}

export function positive(label: string, min: number, max: number) {
  return z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, { message: `${label} must be a finite number` })
    .refine((v) => v > 0, { message: `${label} must be greater than zero` })
    .refine((v) => v >= min && v <= max, { message: `${label} must lie between ${min} and ${max}` });
}

export function nonNegative(label: string, max: number) {
  return z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, { message: `${label} must be a finite number` })
    .refine((v) => v >= 0, { message: `${label} must not be negative` })
    .refine((v) => v <= max, { message: `${label} must not exceed ${max}` });
}

export function wholeCount(label: string, min: number, max: number) {
  return z
    .number({ error: `${label} must be a number` })
    .refine(Number.isInteger, { message: `${label} must be a whole number` })
    .refine((v) => v >= min && v <= max, { message: `${label} must lie between ${min} and ${max}` });
}
