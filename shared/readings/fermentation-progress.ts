import { abvLinearEstimate, apparentAttenuation, platoFromSg } from '@shared/science';
import { BatchProgress } from '../batches/batch';
import { fermentationFlags, GravityPoint } from './fermentation-flags';

/** Apparent attenuation, % (Balling's apparent extracts), or null when it cannot be computed. */
export function attenuationSoFar(og: number | null, latestSg: number | null): number | null {
  if (og === null || latestSg === null || latestSg > og || og <= 1.002) return null;
  return apparentAttenuation(platoFromSg(og), platoFromSg(latestSg));
}

/** ABV so far by the usual OG/FG estimate, or null without an OG. */
export function abvSoFar(og: number | null, latestSg: number | null): number | null {
  if (og === null || latestSg === null || latestSg > og) return null;
  return abvLinearEstimate(og, latestSg);
}

/** Latest gravity, attenuation, ABV so far and the finished/stuck flags of a batch's log (points sorted by time). */
export function fermentationProgress(points: readonly GravityPoint[], og: number | null, expectedAttenuationPercent: number | null): BatchProgress {
  const latest = points.length ? points[points.length - 1] : null;
  const attenuation = attenuationSoFar(og, latest?.sg ?? null);
  const flags = fermentationFlags(points, attenuation, expectedAttenuationPercent);
  return {
    latestSg: latest?.sg ?? null,
    latestAt: latest ? new Date(latest.at).toISOString() : null,
    readingCount: points.length,
    apparentAttenuationPercent: attenuation,
    abvSoFar: abvSoFar(og, latest?.sg ?? null),
    ...flags,
  };
}
