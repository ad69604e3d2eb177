// Two-sided 95 % points of Student's t (the 0.975 quantile) for 1–30 degrees of freedom, as printed
// in any statistics table (e.g. NIST/SEMATECH e-Handbook, table 1.3.6.7.2; values from memory).
const T_975 = [
  12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145, 2.131,
  2.12, 2.11, 2.101, 2.093, 2.086, 2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048, 2.045, 2.042,
];

/** The 0.975 quantile of Student's t with `dof` degrees of freedom (a 95 % two-sided band). */
export function studentT975(dof: number): number {
  if (dof < 1) return Infinity;
  if (dof <= 30) return T_975[Math.floor(dof) - 1];
  if (dof <= 40) return 2.021;
  if (dof <= 60) return 2.0;
  if (dof <= 120) return 1.98;
  return 1.96;
}
