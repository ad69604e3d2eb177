/** Limits of the kit register, read by the server's schemas and the client's validators alike. */
export const KIT_LIMITS = {
  codeMaxLength: 20,
  nameMaxLength: 100,
  notesMaxLength: 2000,
  capacityMaxLitres: 10_000,
  /** A week of cleaning and drying is the longest turnaround the register accepts. */
  turnaroundMaxHours: 168,
  maintenanceWorkMaxLength: 1000,
  maintenanceByMaxLength: 100,
} as const;
