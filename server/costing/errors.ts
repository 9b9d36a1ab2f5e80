/**
 * Thrown when the engine is handed data the API's validation should already have refused
 * (a price that is not a decimal, an unknown Incoterm, a quote without price breaks).
 * Business problems — a missing rate, no quote, an expired pin — are never thrown: they
 * come back as warnings on the result, because a buyer needs to see them beside the numbers.
 */
export class CostingInputError extends Error {
  override readonly name = 'CostingInputError';
  constructor(
    message: string,
    readonly field?: string,
  ) {
    super(field ? `${field}: ${message}` : message);
  }
}
