// Exports of a saved comparison: xlsx (summary, the table of metrics and differences, the
// normalised points, provenance) and a tidy long CSV (one row per profile and quantity).
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { comparisonMetrics, metricLabels } from '../../../shared/comparison/compare';
import type { Db } from '../../db/client';
import type { CurrentUser } from '../../types';
import { getComparison } from '../comparisons/comparisons';

const num = (v: number | null | undefined, digits = 6) => (v == null || !Number.isFinite(v) ? null : Number(v.toPrecision(digits)));

function longRows(saved: Awaited<ReturnType<typeof getComparison>>) {
  const { result, units } = saved.view;
  return result.rows.flatMap((row) =>
    comparisonMetrics.map((m) => {
      const v = row.metrics[m];
      const d = row.differences[m];
      return {
        comparison: saved.name,
        study: row.studyName,
        variant: row.variantName,
        approved: row.approved,
        reference: row.isReference,
        model: row.model ?? '',
        quantity: metricLabels[m],
        unit: m === 'maxActivity' ? units[row.key] : 'pH',
        value: num(v.value),
        se: num(v.se),
        ci95_low: num(v.ci95?.[0]),
        ci95_high: num(v.ci95?.[1]),
        boot95_low: num(v.boot95?.[0]),
        boot95_high: num(v.boot95?.[1]),
        vs_reference: m === 'maxActivity' ? 'ratio' : 'difference',
        vs_reference_value: num(d?.value),
        vs_reference_low: num(d?.ci95?.[0]),
        vs_reference_high: num(d?.ci95?.[1]),
        clear_difference: d?.clear ?? false,
        not_comparable: row.comparability.join(' '),
      };
    }),
  );
}

export async function comparisonCsv(db: Db, user: CurrentUser, id: string) {
  const saved = await getComparison(db, user, id);
  return { name: saved.name, csv: Papa.unparse(longRows(saved)) };
}

export async function comparisonWorkbook(db: Db, user: CurrentUser, id: string) {
  const saved = await getComparison(db, user, id);
  const { result, curves, provenance, globalFit } = saved.view;
  const book = new ExcelJS.Workbook();
  book.creator = 'Bellwether';

  const summary = book.addWorksheet('Summary');
  summary.columns = [{ width: 26 }, { width: 100 }];
  const reference = result.rows.find((r) => r.isReference);
  for (const row of [
    ['Comparison', saved.name],
    ['Reference', reference ? `${reference.variantName} — ${reference.studyName}` : ''],
    ['Profiles', String(result.rows.length)],
    ['Studies not approved', result.rows.filter((r) => !r.approved).map((r) => r.studyName).join(', ') || 'none'],
    ['Method', result.method],
    ['Notes', saved.notes],
    ['Caution', 'Results are research data, not a release test of any product.'],
  ]) summary.addRow(row);
  summary.getColumn(1).font = { bold: true };
  if (globalFit && !('error' in globalFit)) {
    summary.addRow([]);
    summary.addRow(['Global fit', `${globalFit.model}, shared ${globalFit.shared.join(', ')}: preferred ${globalFit.comparison.preferred} (F = ${num(globalFit.comparison.F, 4)}, p = ${num(globalFit.comparison.pValue, 3)}; AICc shared ${num(globalFit.aicc, 5)} vs separate ${num(globalFit.comparison.separate.aicc, 5)})`]);
  }

  const table = book.addWorksheet('Comparison');
  const rows = longRows(saved);
  table.addRow(Object.keys(rows[0] ?? {}));
  table.getRow(1).font = { bold: true };
  for (const r of rows) table.addRow(Object.values(r));

  const points = book.addWorksheet('Normalised points');
  points.addRow(['profile', 'approved', 'pH', 'relative mean', 'relative SD']).font = { bold: true };
  for (const c of curves) for (const p of c.points) points.addRow([c.label, c.approved, p.pH, num(p.mean), num(p.sd)]);

  const prov = book.addWorksheet('Provenance');
  prov.addRow(['profile', 'engine version', 'input hash (SHA-256)', 'computed at', 'approved at', 'approved by']).font = { bold: true };
  for (const p of provenance) prov.addRow([p.key, p.engineVersion, p.inputHash, p.computedAt, p.approvedAt ?? '', p.approvedBy ?? '']);
  return { name: saved.name, buffer: Buffer.from(await book.xlsx.writeBuffer()) };
}
