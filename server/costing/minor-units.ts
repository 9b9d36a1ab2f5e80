// The ISO 4217 table lives in src/shared so the client formats money with the same digits.
export * from '../../src/shared/minor-units';
