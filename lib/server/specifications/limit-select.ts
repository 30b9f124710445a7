import "server-only";

/** The fields of a limit every specification screen and the certificate need. */
export const limitSelect = {
  id: true,
  property: true,
  limitText: true,
  unit: true,
  direction: true,
  significantDigits: true,
  conformanceMethod: true,
  testMethodCode: true,
  testingFrequencyAreaM2: true,
  testingFrequencyPerLot: true,
} as const;

/** Limits in the order of the TestProperty enum (index flux first), which PostgreSQL sorts enums by. */
export const limitOrder = { property: "asc" } as const;
