// Number and identifier schemas shared by every part of the scenario format. Units live in field
// names (…Mm, …Seconds, …MmPerS, …MmPerS2, …MmPerS3); all lengths are millimetres, all times seconds.
import { z } from 'zod';
import { finiteNumber } from './distribution';

export const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,39}$/;

/** Ids are short, case-sensitive and unique within their kind (deck, lane, transfer, step, station). */
export const idSchema = z
  .string({ error: 'id must be text' })
  .regex(ID_PATTERN, 'id must be 1 to 40 letters, digits, "_", "." or "-", starting with a letter or digit');

export const labelSchema = z
  .string({ error: 'name must be text' })
  .trim()
  .min(1, 'name is required')
  .max(120, 'name must be at most 120 characters');

export const positive = (name: string) => finiteNumber(name).refine((v) => v > 0, `${name} must be above zero`);
export const nonNegative = (name: string) => finiteNumber(name).refine((v) => v >= 0, `${name} must be zero or more`);
export const between = (name: string, min: number, max: number) =>
  finiteNumber(name).refine((v) => v >= min && v <= max, `${name} must be from ${min} to ${max}`);
export const wholeBetween = (name: string, min: number, max: number) =>
  between(name, min, max).refine(Number.isInteger, `${name} must be a whole number`);
/** A share of parts or time, from 0 to 1. */
export const share = (name: string) => between(name, 0, 1);
