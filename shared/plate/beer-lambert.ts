/**
 * Beer–Lambert (SCIENCE.md §3.2):  A = ε·l·c,  so  c = A/(ε·l)  and  rate [M/s] = (dA/dt)/(ε·l).
 * Units are explicit: ε in M⁻¹cm⁻¹ or mM⁻¹cm⁻¹, l in cm, slopes per second or per minute. Results are in
 * M and M/s, with µM and µM/min beside them for display.
 *
 * Path length from the filled volume: l = V/(area of the well bottom), 1 µL = 1 mm³; this ignores the
 * meniscus, which shortens the light path at the centre of the well (SCIENCE.md §3.2: about
 * 0.55–0.6 cm for 200 µL in a 96-well plate [memory]); the result is always flagged so.
 */
import type { PlateFlag } from './flags';
import { isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export type EpsilonUnit = 'M-1cm-1' | 'mM-1cm-1';
export type TimeUnit = 's' | 'min';

export interface Extinction {
  value: number;
  unit: EpsilonUnit;
}

/** ε in M⁻¹cm⁻¹ (1 mM⁻¹cm⁻¹ = 1000 M⁻¹cm⁻¹); null for a bad value or unit. */
export function epsilonPerMolarCm(epsilon: Extinction): number | null {
  if (
    typeof epsilon !== 'object' ||
    epsilon === null ||
    !isFiniteNumber(epsilon.value) ||
    !(epsilon.value > 0)
  )
    return null;
  if (epsilon.unit === 'M-1cm-1') return epsilon.value;
  if (epsilon.unit === 'mM-1cm-1') return epsilon.value * 1000;
  return null;
}

function optics(epsilon: Extinction, pathLengthCm: number): PlateResult<number> {
  const eps = epsilonPerMolarCm(epsilon);
  if (eps === null) {
    return fail(
      'invalid_option',
      "The extinction coefficient must be a positive number in 'M-1cm-1' or 'mM-1cm-1'.",
    );
  }
  if (!isFiniteNumber(pathLengthCm) || !(pathLengthCm > 0)) {
    return fail(
      'invalid_option',
      `The path length must be a positive number of cm (got ${String(pathLengthCm)}).`,
    );
  }
  return ok(eps * pathLengthCm);
}

/** c = A/(ε·l). */
export function concentrationFromAbsorbance(
  absorbance: number,
  options: { epsilon: Extinction; pathLengthCm: number },
): PlateResult<{ molar: number; micromolar: number }> {
  const el = optics(options?.epsilon, options?.pathLengthCm);
  if (!el.ok) return el;
  if (!isFiniteNumber(absorbance))
    return fail('invalid_input', `The absorbance is not a number (${String(absorbance)}).`);
  const molar = absorbance / el.value;
  if (!Number.isFinite(molar * 1e6))
    return fail('degenerate', 'The concentration cannot be computed from these numbers.');
  return ok({ molar, micromolar: molar * 1e6 });
}

export interface MolarRate {
  molarPerSecond: number;
  micromolarPerMinute: number;
  /** Standard errors, when the slope's SE was given. */
  seMolarPerSecond: number | null;
  seMicromolarPerMinute: number | null;
}

/** rate = (dA/dt)/(ε·l), with the slope per second or per minute. */
export function rateFromAbsorbanceSlope(
  slope: number,
  options: { epsilon: Extinction; pathLengthCm: number; timeUnit: TimeUnit; slopeSe?: number | null },
): PlateResult<MolarRate> {
  const el = optics(options?.epsilon, options?.pathLengthCm);
  if (!el.ok) return el;
  if (options.timeUnit !== 's' && options.timeUnit !== 'min') {
    return fail('invalid_option', "The slope's time unit must be 's' or 'min'.");
  }
  if (!isFiniteNumber(slope))
    return fail('invalid_input', `The absorbance slope is not a number (${String(slope)}).`);
  const perSecond = options.timeUnit === 'min' ? 1 / 60 : 1;
  const molarPerSecond = (slope * perSecond) / el.value;
  const se = isFiniteNumber(options.slopeSe) ? (Math.abs(options.slopeSe) * perSecond) / el.value : null;
  if (![molarPerSecond * 60e6, (se ?? 0) * 60e6].every(Number.isFinite)) {
    return fail('degenerate', 'The rate cannot be computed from these numbers.');
  }
  return ok({
    molarPerSecond,
    micromolarPerMinute: molarPerSecond * 60e6,
    seMolarPerSecond: se,
    seMicromolarPerMinute: se === null ? null : se * 60e6,
  });
}

/**
 * l = V/area, with V in µL (= mm³) and the well bottom given by its diameter (round wells) or its area
 * (square wells), in mm and mm²; returned in cm.
 */
export function pathLengthFromVolume(options: {
  volumeUl: number;
  wellDiameterMm?: number;
  wellAreaMm2?: number;
}): PlateResult<{ pathLengthCm: number; flags: PlateFlag[] }> {
  const { volumeUl, wellDiameterMm, wellAreaMm2 } = options ?? {};
  if (!isFiniteNumber(volumeUl) || !(volumeUl > 0)) {
    return fail(
      'invalid_option',
      `The well volume must be a positive number of µL (got ${String(volumeUl)}).`,
    );
  }
  let area: number;
  if (wellAreaMm2 !== undefined) {
    if (!isFiniteNumber(wellAreaMm2) || !(wellAreaMm2 > 0)) {
      return fail(
        'invalid_option',
        `The well area must be a positive number of mm² (got ${String(wellAreaMm2)}).`,
      );
    }
    area = wellAreaMm2;
  } else if (isFiniteNumber(wellDiameterMm) && wellDiameterMm > 0) {
    area = Math.PI * (wellDiameterMm / 2) ** 2;
  } else {
    return fail(
      'invalid_option',
      'Give the well bottom as a diameter in mm (round wells) or an area in mm².',
    );
  }
  const pathLengthCm = finiteOrNull(volumeUl / area / 10);
  if (pathLengthCm === null)
    return fail('degenerate', 'The path length cannot be computed from these numbers.');
  return ok({ pathLengthCm, flags: ['meniscus_not_corrected'] });
}
