/**
 * Standard curves from the plates' standard wells (shared/plate fitStandardCurve: signal = a + b·c,
 * c in µM). For each plate: one curve per pH at which standards were read (best practice when the
 * product's absorbance depends on pH, SCIENCE.md §3.2), and one from all its standards. A plate
 * without usable standards borrows the curve of every standard in the study (flagged).
 * A curve needs ≥ 3 standards at ≥ 2 concentrations; excluded standards are left out.
 */
import { fitStandardCurve, type StandardCurve } from '../plate';
import { phKey } from './blanks';
import type { StandardCurveRecord, WellRow } from './types';

export interface CurveChoice {
  curve: StandardCurve;
  record: StandardCurveRecord;
}

export class StandardBook {
  private readonly byKey = new Map<string, CurveChoice>();
  private study: CurveChoice | null | undefined;
  private readonly standards: WellRow[];

  constructor(rows: readonly WellRow[]) {
    this.standards = rows.filter(
      (r) => r.role === 'standard' && !r.excluded && r.standardSignal !== null && r.concentrationUm !== null,
    );
    const groups = new Map<string, WellRow[]>();
    for (const r of this.standards) {
      const keys = [`${r.plateId}|plate`];
      if (r.pH !== null) keys.push(`${r.plateId}|${phKey(r.pH)}`);
      for (const k of keys) groups.set(k, [...(groups.get(k) ?? []), r]);
    }
    for (const [key, members] of groups) {
      const [plateId, which] = key.split('|');
      const fit = this.fit(
        members,
        plateId,
        which === 'plate' ? null : Number(which),
        which === 'plate' ? 'plate' : 'pH',
      );
      if (fit) this.byKey.set(key, fit);
    }
  }

  private fit(
    members: WellRow[],
    plateId: string,
    pH: number | null,
    scope: StandardCurveRecord['scope'],
  ): CurveChoice | null {
    const result = fitStandardCurve(
      members.map((r) => ({ concentration: r.concentrationUm!, signal: r.standardSignal })),
    );
    if (!result.ok) return null;
    const c = result.value;
    return {
      curve: c,
      record: {
        plateId,
        pH,
        scope,
        n: c.n,
        slope: c.slope,
        slopeSe: c.slopeSe,
        intercept: c.intercept,
        interceptSe: c.interceptSe,
        residualSd: c.residualSd,
        r2: c.r2,
        concentrationRangeUm: c.concentrationRange,
        signalRange: c.signalRange,
        wells: members.map((r) => (scope === 'study' ? `${r.plateId}:${r.well}` : r.well)),
        flags: c.flags,
      },
    };
  }

  get any(): boolean {
    return this.byKey.size > 0;
  }

  private studyCurve(): CurveChoice | null {
    if (this.study === undefined) this.study = this.fit(this.standards, '*', null, 'study');
    return this.study;
  }

  /** The curve for a sample: its pH's curve on its plate, else its plate's, else the study's (flagged). */
  pick(row: WellRow): { choice: CurveChoice; atPh: boolean; flag: string | null } | null {
    const atPh = row.pH === null ? undefined : this.byKey.get(`${row.plateId}|${phKey(row.pH)}`);
    if (atPh) return { choice: atPh, atPh: true, flag: null };
    const plate = this.byKey.get(`${row.plateId}|plate`);
    if (plate) return { choice: plate, atPh: false, flag: null };
    const study = this.studyCurve();
    return study ? { choice: study, atPh: false, flag: 'standard_curve_other_plates' } : null;
  }

  records(): StandardCurveRecord[] {
    const out = [...this.byKey.values()].map((c) => c.record);
    if (this.study) out.push(this.study.record);
    return out;
  }
}
