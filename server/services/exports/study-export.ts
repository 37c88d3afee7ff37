// Exports of a study: an xlsx workbook in Bellwether's own layout (summary, parameters with their
// intervals, per-point and per-well data, plate maps, provenance) and a tidy long CSV (one row per well).
import ExcelJS from 'exceljs';
import { asc, desc, eq } from 'drizzle-orm';
import Papa from 'papaparse';
import type { AnalysisResult, VariantProfile } from '../../../shared/analysis';
import type { ParameterEstimate } from '../../../shared/fitting';
import type { PlateMap } from '../../../shared/plate-map/schema';
import type { Db } from '../../db/client';
import { assays, enzymes, plates, readerFiles, studies, studyEvents, teams, users } from '../../db/schema';
import type { CurrentUser } from '../../types';
import { getAnalysis } from '../analysis/analysis';
import { loadVisible } from '../records/audited';

const num = (v: number | null | undefined, digits = 6) => (v == null || !Number.isFinite(v) ? null : Number(v.toPrecision(digits)));

export const parameterColumns = ['value', 'SE', '95 % low', '95 % high', 'profile low', 'profile high', 'bootstrap low', 'bootstrap high'];

export function estimateCells(e: Partial<ParameterEstimate> | null | undefined) {
  return [
    num(e?.value),
    num(e?.se),
    num(e?.ci95?.[0]),
    num(e?.ci95?.[1]),
    num(e?.profile95?.[0]),
    num(e?.profile95?.[1]),
    num(e?.boot95?.[0]),
    num(e?.boot95?.[1]),
  ];
}

/** Rows of the parameter table: one per variant and quantity. */
export function parameterRows(profiles: VariantProfile[]) {
  const rows: (string | number | null)[][] = [];
  for (const p of profiles) {
    const fit = p.fit;
    if (!fit) {
      rows.push([p.name, null, 'no fit', ...Array(parameterColumns.length).fill(null), p.error?.message ?? '']);
      continue;
    }
    const flags = fit.flags.map((f) => f.code).join(' ');
    const quantities: [string, Partial<ParameterEstimate> | null][] = [
      ...fit.parameterNames.map((n) => [n, fit.parameters[n]] as [string, ParameterEstimate]),
      ['pH optimum', fit.pHopt],
      ['peak activity', fit.peak],
      ['half-activity low pH', fit.window.lo],
      ['half-activity high pH', fit.window.hi],
      ['half-activity width', fit.window.width],
    ];
    for (const [name, estimate] of quantities) rows.push([p.name, fit.model, name, ...estimateCells(estimate), flags]);
  }
  return rows;
}

function wellRows(result: AnalysisResult, plateNames: Map<string, string>, variantNames: Map<string, string>) {
  return result.wells.map((w) => ({
    plate: plateNames.get(w.plateId) ?? w.plateId,
    well: w.well,
    role: w.role,
    variant: w.variantId ? (variantNames.get(w.variantId) ?? w.variantId) : '',
    pH: w.pH,
    buffer: w.buffer ?? '',
    replicate: w.replicate,
    [`signal (${result.units.signal})`]: num(w.signal),
    signal_se: num(w.signalSe),
    window_start_s: w.window?.startS ?? null,
    window_end_s: w.window?.endS ?? null,
    window_source: w.window?.source ?? '',
    r2: num(w.r2),
    blank_mean: num(w.blank?.mean),
    corrected: num(w.corrected),
    [`rate (${result.units.rate})`]: num(w.rate),
    [`activity (${result.units.activity})`]: num(w.activity),
    activity_se: num(w.activitySe),
    flags: w.flags.join(' '),
    reader_flag: w.readerFlag ?? '',
    excluded: w.excluded,
    exclusion_reason: w.exclusion?.reason ?? '',
    outlier: w.outlier,
  }));
}

async function gather(db: Db, user: CurrentUser, studyId: string) {
  const study = await loadVisible(db, studies, studyId, user, 'That study');
  const analysis = await getAnalysis(db, user, studyId);
  const [team, enzyme, assay] = await Promise.all([
    db.query.teams.findFirst({ where: eq(teams.id, study.teamId) }),
    db.query.enzymes.findFirst({ where: eq(enzymes.id, study.enzymeId) }),
    db.query.assays.findFirst({ where: eq(assays.id, study.assayId) }),
  ]);
  const studyPlates = await db.select().from(plates).where(eq(plates.studyId, studyId)).orderBy(asc(plates.createdAt));
  const files = await db
    .select({ f: readerFiles, by: users.name, plate: plates.name })
    .from(readerFiles)
    .innerJoin(plates, eq(plates.id, readerFiles.plateId))
    .innerJoin(users, eq(users.id, readerFiles.uploadedBy))
    .where(eq(plates.studyId, studyId))
    .orderBy(asc(readerFiles.uploadedAt));
  const events = await db
    .select({ e: studyEvents, by: users.name })
    .from(studyEvents)
    .innerJoin(users, eq(users.id, studyEvents.authorId))
    .where(eq(studyEvents.studyId, studyId))
    .orderBy(desc(studyEvents.createdAt));
  const variantNames = new Map(analysis.result.profiles.map((p) => [p.variantId, p.name]));
  const plateNames = new Map(studyPlates.map((p) => [p.id, p.name]));
  return { study, analysis, team, enzyme, assay, studyPlates, files, events, variantNames, plateNames };
}

export async function studyCsv(db: Db, user: CurrentUser, studyId: string) {
  const g = await gather(db, user, studyId);
  const rows = wellRows(g.analysis.result, g.plateNames, g.variantNames).map((r) => ({ study: g.study.name, ...r }));
  return { name: g.study.name, csv: Papa.unparse(rows) };
}

export async function studyWorkbook(db: Db, user: CurrentUser, studyId: string) {
  const g = await gather(db, user, studyId);
  const { result } = g.analysis;
  const book = new ExcelJS.Workbook();
  book.creator = 'Bellwether';
  const bold = (sheet: ExcelJS.Worksheet) => (sheet.getRow(1).font = { bold: true });

  const summary = book.addWorksheet('Summary');
  summary.columns = [{ width: 28 }, { width: 90 }];
  const reference = g.analysis.result.profiles.find((p) => p.isReference)?.name ?? '';
  for (const row of [
    ['Study', g.study.name],
    ['Status', g.study.status],
    ['Team', g.team?.name ?? ''],
    ['Enzyme', g.enzyme?.name ?? ''],
    ['Assay', `${g.assay?.name ?? ''} (${g.assay?.readMode}, ${g.assay?.wavelengthNm} nm, ${g.assay?.temperatureC} °C)`],
    ['Reference variant', reference],
    ['Activity', `${result.units.activityLabel} (${result.units.activity}). ${result.units.note}`],
    ['Apparent pKa values', 'Fitted pKa values are apparent, macroscopic constants of the active form.'],
    ['Caution', 'Results are research data, not a release test of any product.'],
  ]) summary.addRow(row);
  summary.getColumn(1).font = { bold: true };

  const params = book.addWorksheet('Parameters');
  params.addRow(['variant', 'model', 'quantity', ...parameterColumns, 'flags']);
  for (const row of parameterRows(result.profiles)) params.addRow(row);
  bold(params);

  const points = book.addWorksheet('Points');
  points.addRow(['variant', 'pH', 'buffer', 'n', `mean (${result.units.activity})`, 'SD', 'CV %', 'excluded wells']);
  for (const p of result.profiles) {
    for (const pt of p.points) {
      points.addRow([p.name, pt.pH, pt.buffer ?? '', pt.n, num(pt.mean), num(pt.sd), num(pt.cvPercent, 3), pt.excluded.map((e) => `${g.plateNames.get(e.plateId)} ${e.well}: ${e.reason}`).join('; ')]);
    }
  }
  bold(points);

  const wells = book.addWorksheet('Wells');
  const wr = wellRows(result, g.plateNames, g.variantNames);
  if (wr.length) {
    wells.addRow(Object.keys(wr[0]));
    for (const r of wr) wells.addRow(Object.values(r));
    bold(wells);
  }

  const maps = book.addWorksheet('Plate maps');
  for (const plate of g.studyPlates) {
    const map = plate.map as PlateMap;
    const rowsCount = plate.format === 384 ? 16 : 8;
    const cols = plate.format === 384 ? 24 : 12;
    maps.addRow([`${plate.name} (${plate.format} wells) — role / variant / pH / replicate`]).font = { bold: true };
    maps.addRow(['', ...Array.from({ length: cols }, (_, c) => c + 1)]);
    for (let r = 0; r < rowsCount; r += 1) {
      const letter = 'ABCDEFGHIJKLMNOP'[r];
      maps.addRow([
        letter,
        ...Array.from({ length: cols }, (_, c) => {
          const w = map.wells[`${letter}${c + 1}`];
          if (!w) return '';
          const variant = w.variantId ? (g.variantNames.get(w.variantId) ?? '?') : '';
          return [w.role, variant, w.pH != null ? `pH ${w.pH}` : '', w.replicate ? `r${w.replicate}` : ''].filter(Boolean).join(' / ');
        }),
      ]);
    }
    maps.addRow([]);
  }

  const prov = book.addWorksheet('Provenance');
  prov.columns = [{ width: 26 }, { width: 70 }, { width: 24 }, { width: 30 }];
  prov.addRow(['Engine version', result.engineVersion]);
  prov.addRow(['Analysis version', result.analysisVersion]);
  prov.addRow(['Input hash (SHA-256)', g.analysis.inputHash]);
  prov.addRow(['Computed at', g.analysis.computedAt]);
  prov.addRow(['Bootstrap', g.analysis.bootstrap.current ? `${g.analysis.bootstrap.resamples} resamples at ${g.analysis.bootstrap.at}` : 'not run for these inputs']);
  prov.addRow([]);
  prov.addRow(['Raw file', 'SHA-256', 'size (bytes)', 'uploaded']).font = { bold: true };
  for (const { f, by, plate } of g.files) prov.addRow([`${plate}: ${f.fileName}`, f.sha256, f.sizeBytes, `${by}, ${f.uploadedAt.toISOString()}`]);
  prov.addRow([]);
  prov.addRow(['Review', 'comment', 'by', 'when']).font = { bold: true };
  for (const { e, by } of g.events) prov.addRow([e.kind, e.body, by, e.createdAt.toISOString()]);
  prov.addRow([]);
  prov.addRow(['Exclusion', 'reason', 'by', 'when / lifted']).font = { bold: true };
  for (const x of g.analysis.exclusions) {
    prov.addRow([`${x.plateName} ${x.well}`, x.reason, x.createdBy, x.liftedAt ? `${x.createdAt}; lifted ${x.liftedAt} by ${x.liftedBy}: ${x.liftReason}` : x.createdAt]);
  }
  return { name: g.study.name, buffer: Buffer.from(await book.xlsx.writeBuffer()) };
}
