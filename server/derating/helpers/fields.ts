import { z } from 'zod';

/**
 * zod field builders for the circuit helpers' inputs, so every rejection names the field,
 * its unit and what is expected (e.g. "capacitanceF must be greater than 0 F").
 */

export function finiteNumber(name: string, unit: string) {
  return z.number({
    error: (issue) =>
      issue.input === undefined ? `${name} is required (${unit})` : `${name} must be a finite number (${unit})`,
  });
}

export function positiveNumber(name: string, unit: string) {
  return finiteNumber(name, unit).gt(0, { error: `${name} must be greater than 0 ${unit}` });
}

export function nonNegativeNumber(name: string, unit: string) {
  return finiteNumber(name, unit).min(0, { error: `${name} must be 0 ${unit} or more` });
}

/** A policy limit: the allowed fraction of a rating. */
export function fractionLimit(name: string) {
  return finiteNumber(name, 'fraction of the rating')
    .gt(0, { error: `${name} must be above 0` })
    .lte(1, { error: `${name} is a fraction of the rating, at most 1 (0.8 means 80 %)` });
}
