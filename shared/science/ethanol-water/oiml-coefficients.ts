// OIML R 22 (1975), International Alcoholometric Tables, density equation coefficients.
// rho(p, t) = A1 + sum_{k=2..12} A_k p^(k-1) + sum_{k=1..6} B_k (t-20)^k + sum_i sum_k C_{i,k} p^k (t-20)^i
// with p the mass fraction of ethanol, t in °C (ITS-68 in the original), rho in kg/m³.
// The same coefficients are printed in the annex of Council Directive 76/766/EEC (alcohol tables);
// oiml-density.spec.ts checks them against table points at both pure ends and between.

/** A_1 … A_12: the 20 °C polynomial in mass fraction, kg/m³. */
export const OIML_A: readonly number[] = [
  998.20123, -192.9769495, 389.1238958, -1668.103923, 13522.15441, -88292.78388,
  306287.4042, -613838.1234, 747017.2998, -547846.1354, 223446.0334, -39032.85426,
];

/** B_1 … B_6: pure-water temperature terms, kg/m³ per °C^k. */
export const OIML_B: readonly number[] = [
  -2.0618513e-1, -5.2682542e-3, 3.6130013e-5, -3.8957702e-7, 7.1693540e-9, -9.9739231e-11,
];

/** C_{i,k}: row i is the power of (t-20), entry k-1 the power k of p. */
export const OIML_C: readonly (readonly number[])[] = [
  [
    1.693443461530087e-1, -1.046914743455169e1, 7.196353469546523e1, -7.047478054272792e2,
    3.924090430035045e3, -1.210164659068747e4, 2.248646550400788e4, -2.605562982188164e4,
    1.852373922069467e4, -7.420201433430137e3, 1.285617841998974e3,
  ],
  [
    -1.193013005057010e-2, 2.517399633803461e-1, -2.170575700536993, 1.353034988843029e1,
    -5.029988758547014e1, 1.096355666577570e2, -1.422753946421155e2, 1.080435942856230e2,
    -4.414153236817392e1, 7.442971530188783,
  ],
  [
    -6.802995733503803e-4, 1.876837790289664e-2, -2.002561813734156e-1, 1.022992966719220,
    -2.895696483903638, 4.810060584300675, -4.672147440794683, 2.458043105903461,
    -5.411227621436812e-1,
  ],
  [4.075376675622027e-6, -8.763058573471110e-6, 6.515031360099368e-6, -1.515784836987210e-6],
  [-2.788074354782409e-8, 1.345612883493354e-8],
];
