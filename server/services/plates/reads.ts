// Reader files: preview what the parser found (nothing stored), then import the confirmed blocks.
// The import stores the raw file unchanged with its SHA-256, the reads and every well record in
// one transaction, so a file that fails leaves nothing behind.
import { createHash } from 'node:crypto';
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { BlockPreview, ImportPreview, ReadData, ReadSummary } from '../../../shared/schemas/plates-types';
import type { ImportSelection } from '../../../shared/schemas/plates';
import type { Db, Tx } from '../../db/client';
import { plates, readerFiles, reads, users, wellRecords } from '../../db/schema';
import { AppError, badRequest, conflict } from '../../errors';
import { parseReaderFile, type ParsedBlock, type ParsedReaderFile } from '../../import';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { asJson, loadVisible } from '../records/audited';
import { loadEditablePlate } from './plates';

export type Upload = { bytes: Buffer; fileName: string };

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

async function parseOrRefuse(upload: Upload): Promise<ParsedReaderFile> {
  const result = await parseReaderFile(new Uint8Array(upload.bytes.buffer, upload.bytes.byteOffset, upload.bytes.length), upload.fileName);
  if (!result.ok) {
    const where = [result.error.sheet && `sheet '${result.error.sheet}'`, result.error.cell && `cell ${result.error.cell}`].filter(Boolean).join(', ');
    const status = result.error.code === 'too_large' ? 413 : result.error.code === 'internal' ? 422 : 400;
    throw new AppError(`import_${result.error.code}`, `${result.error.message}${where && !result.error.message.toLowerCase().includes(where.toLowerCase()) ? ` (${where})` : ''}`, status);
  }
  return result.value;
}

function previewOf(block: ParsedBlock, index: number, plateFormat: number): BlockPreview {
  const values = Object.entries(block.wells);
  const preview: Record<string, number | null> =
    block.kind === 'endpoint'
      ? block.wells
      : Object.fromEntries(values.map(([well, series]) => [well, (series as (number | null)[]).findLast((v) => v !== null) ?? null]));
  const missing = Object.values(preview).filter((v) => v === null).length;
  return {
    index,
    kind: block.kind,
    plateFormat: block.plateFormat,
    sheet: block.sheet,
    label: block.label,
    location: `${block.detail.location.topLeft}:${block.detail.location.bottomRight}`,
    layout: block.detail.layout,
    wavelengthNm: block.detail.wavelength.nm ?? block.detail.wavelength.emissionNm,
    excitationNm: block.detail.wavelength.excitationNm,
    wellsWithValues: values.length - missing,
    missing,
    flags: block.flags,
    timesS: block.kind === 'kinetic' ? block.times_s : null,
    preview,
    formatMatchesPlate: block.plateFormat === plateFormat,
  };
}

async function duplicatesOf(db: Db, teamId: string, hash: string) {
  return db
    .select({ plateId: plates.id, plateName: plates.name, uploadedAt: readerFiles.uploadedAt, uploadedBy: users.name })
    .from(readerFiles)
    .innerJoin(plates, eq(plates.id, readerFiles.plateId))
    .innerJoin(users, eq(users.id, readerFiles.uploadedBy))
    .where(and(eq(readerFiles.teamId, teamId), eq(readerFiles.sha256, hash)));
}

export async function previewImport(db: Db, user: CurrentUser, plateId: string, upload: Upload): Promise<ImportPreview> {
  const { plate } = await db.transaction((tx) => loadEditablePlate(tx, user, plateId));
  const parsed = await parseOrRefuse(upload);
  const hash = sha256(upload.bytes);
  return asJson({
    fileName: upload.fileName,
    sizeBytes: upload.bytes.length,
    sha256: hash,
    fileType: parsed.fileType,
    blocks: parsed.blocks.map((b, i) => previewOf(b, i, plate.format)),
    notes: parsed.notes,
    duplicates: await duplicatesOf(db, plate.teamId, hash),
  });
}

type ReadRow = typeof reads.$inferInsert;
type WellRow = Omit<typeof wellRecords.$inferInsert, 'readId'>;

/** Turns the confirmed selection into reads and well rows, checking it against the parsed blocks. */
function buildReads(parsed: ParsedReaderFile, selection: ImportSelection, plateFormat: number) {
  const block = (i: number) => {
    const b = parsed.blocks[i];
    if (!b) throw badRequest(`Block ${i + 1} does not exist; the file has ${parsed.blocks.length} block(s).`);
    if (b.plateFormat !== plateFormat) {
      throw badRequest(`Block ${i + 1} ('${b.label}') is a ${b.plateFormat}-well plate; this plate has ${plateFormat} wells.`);
    }
    return b;
  };
  const located = (b: ParsedBlock) => ({ sheet: b.sheet, location: `${b.detail.location.topLeft}:${b.detail.location.bottomRight}` });
  return selection.map((item): { read: Omit<ReadRow, 'teamId' | 'plateId' | 'fileId'>; wells: WellRow[] } => {
    if (item.type === 'grids-as-kinetic') {
      if (item.timesS.length !== item.blockIndices.length) {
        throw badRequest(`Give one time per grid: ${item.blockIndices.length} grids, ${item.timesS.length} times.`);
      }
      if (item.timesS.some((t, i) => i > 0 && t <= item.timesS[i - 1])) throw badRequest('Times must increase from grid to grid.');
      const grids = item.blockIndices.map(block);
      if (grids.some((g) => g.kind !== 'endpoint')) throw badRequest('Only plate grids (end-point blocks) can be combined into a time course.');
      const names = Object.keys(grids[0].wells);
      return {
        read: { blockIndex: item.blockIndices[0], kind: 'kinetic', label: item.label ?? `${grids[0].label} (${grids.length} reads)`, wavelengthNm: item.wavelengthNm, timesS: item.timesS, ...located(grids[0]) },
        wells: names.map((well) => {
          const values = grids.map((g) => (g.wells as Record<string, number | null>)[well] ?? null);
          const flag = grids.map((g) => g.flags[well]).find(Boolean) ?? null;
          return { well, value: null, values, flag, pointFlags: null };
        }),
      };
    }
    const b = block(item.blockIndex);
    if (item.type !== b.kind) {
      throw badRequest(`Block ${item.blockIndex + 1} ('${b.label}') is ${b.kind === 'kinetic' ? 'a time course' : 'a single read'}, not ${item.type === 'kinetic' ? 'a time course' : 'a single read'}.`);
    }
    const wavelengthNm = item.wavelengthNm ?? b.detail.wavelength.nm ?? b.detail.wavelength.emissionNm ?? null;
    const label = item.label ?? b.label;
    if (b.kind === 'endpoint') {
      return {
        read: { blockIndex: item.blockIndex, kind: 'endpoint', label, wavelengthNm, timesS: null, ...located(b) },
        wells: Object.entries(b.wells).map(([well, value]) => ({ well, value, values: null, flag: b.flags[well] ?? null, pointFlags: null })),
      };
    }
    return {
      read: { blockIndex: item.blockIndex, kind: 'kinetic', label, wavelengthNm, timesS: b.times_s, ...located(b) },
      wells: Object.entries(b.wells).map(([well, values]) => ({
        well,
        value: null,
        values,
        flag: b.flags[well] ?? null,
        pointFlags: b.detail.points[well]?.length ? b.detail.points[well] : null,
      })),
    };
  });
}

/**
 * `{0.1,null,0.3}`: the array literal PostgreSQL reads. JSON.stringify writes each number as its
 * shortest round-trip form (as String() does, several times faster than join for 46 000 numbers);
 * the parser only hands on finite numbers, and PostgreSQL reads `null` as a missing element.
 */
const floatArray = (values: readonly (number | null)[]) => `{${JSON.stringify(values).slice(1, -1)}}`;

/**
 * Every well of one read in one statement: each column travels as one array parameter and unnest
 * pairs them up again, row by row (a multi-row VALUES list would need six parameters per well).
 * The kinetic series go as a text array of array literals, each cast to float8[] on its row.
 */
async function insertWells(tx: Tx, readId: string, wells: WellRow[]) {
  if (wells.length === 0) return;
  const series = `{${wells.map((w) => (w.values ? `"${floatArray(w.values)}"` : 'NULL')).join(',')}}`;
  await tx.insert(wellRecords).select(sql`
    select ${readId}::uuid, w.well, w.value, w.series::float8[], w.flag, w.point_flags::jsonb
    from unnest(
      ${sql.param(wells.map((w) => w.well))}::text[],
      ${floatArray(wells.map((w) => w.value ?? null))}::float8[],
      ${series}::text[],
      ${sql.param(wells.map((w) => w.flag ?? null))}::text[],
      ${sql.param(wells.map((w) => (w.pointFlags ? JSON.stringify(w.pointFlags) : null)))}::text[]
    ) as w(well, value, series, flag, point_flags)`);
}

type Settled<T> = { ok: true; value: T } | { ok: false; error: unknown };
const settle = <T>(promise: Promise<T>): Promise<Settled<T>> =>
  promise.then(
    (value) => ({ ok: true, value }),
    (error: unknown) => ({ ok: false, error }),
  );
const unwrap = <T>(settled: Settled<T>): T => {
  if (!settled.ok) throw settled.error;
  return settled.value;
};

/** The plate (editable by this user) and the raw file, unless this plate already has the very same file. */
async function storeRawFile(tx: Tx, user: CurrentUser, plateId: string, upload: Upload, hash: string, contentType: string) {
  const { plate } = await loadEditablePlate(tx, user, plateId);
  const duplicate = (await tx.$count(readerFiles, and(eq(readerFiles.plateId, plateId), eq(readerFiles.sha256, hash)))) > 0;
  if (duplicate) return { plate, fileId: null };
  const [file] = await tx
    .insert(readerFiles)
    .values({ teamId: plate.teamId, plateId, fileName: upload.fileName, sizeBytes: upload.bytes.length, sha256: hash, contentType, content: upload.bytes, uploadedBy: user.id })
    .returning({ id: readerFiles.id });
  return { plate, fileId: file.id };
}

export async function importReads(db: Db, user: CurrentUser, plateId: string, upload: Upload, selection: ImportSelection, contentType: string) {
  const hash = sha256(upload.bytes);
  // Node parses the file while PostgreSQL, on the other core, checks the plate and stores the raw
  // bytes. The answer is the one the steps in turn would give: a parse error first, then the
  // plate's, then the selection's, then the duplicate; any of them rolls the stored file back.
  const parsing = settle(parseOrRefuse(upload));
  return db.transaction(async (tx) => {
    const stored = await settle(storeRawFile(tx, user, plateId, upload, hash, contentType));
    const parsed = unwrap(await parsing);
    const { plate, fileId } = unwrap(stored);
    const built = buildReads(parsed, selection, plate.format);
    if (fileId === null) throw conflict('This very file was already imported into this plate.', 'duplicate_file');
    const created: string[] = [];
    for (const { read, wells } of built) {
      const [row] = await tx.insert(reads).values({ ...read, teamId: plate.teamId, plateId, fileId }).returning({ id: reads.id });
      created.push(row.id);
      await insertWells(tx, row.id, wells);
    }
    await tx.update(plates).set({ updatedAt: new Date() }).where(eq(plates.id, plateId));
    await writeAudit(tx, {
      actorId: user.id,
      teamId: plate.teamId,
      entity: 'reader-file',
      entityId: fileId,
      action: 'import',
      after: { plateId, fileName: upload.fileName, sha256: hash, sizeBytes: upload.bytes.length, reads: built.map((b, i) => ({ id: created[i], ...b.read, wells: b.wells.length })) },
    });
    return { fileId, readIds: created, sha256: hash };
  });
}

function readSummaryQuery(db: Db) {
  return db
    .select({
      read: reads,
      fileName: readerFiles.fileName,
      sha256: readerFiles.sha256,
      uploadedAt: readerFiles.uploadedAt,
      uploadedBy: users.name,
      wellCount: sql<number>`(select count(*)::int from ${wellRecords} where ${wellRecords.readId} = ${reads.id})`,
      // Wells with no usable value at all (an end point missing, or every point of a time course).
      missingCount: sql<number>`(select count(*)::int from ${wellRecords} where ${wellRecords.readId} = ${reads.id} and ${wellRecords.value} is null and coalesce(cardinality(array_remove(${wellRecords.values}, null)), 0) = 0)`,
    })
    .from(reads)
    .innerJoin(readerFiles, eq(readerFiles.id, reads.fileId))
    .innerJoin(users, eq(users.id, readerFiles.uploadedBy))
    .$dynamic();
}

type SummaryRow = Awaited<ReturnType<ReturnType<typeof readSummaryQuery>['execute']>>[number];
const toSummary = (r: SummaryRow): ReadSummary =>
  asJson({
    id: r.read.id,
    fileId: r.read.fileId,
    fileName: r.fileName,
    sha256: r.sha256,
    kind: r.read.kind,
    label: r.read.label,
    wavelengthNm: r.read.wavelengthNm,
    sheet: r.read.sheet,
    location: r.read.location,
    timesS: r.read.timesS,
    uploadedBy: r.uploadedBy,
    uploadedAt: r.uploadedAt,
    wellCount: r.wellCount,
    missingCount: r.missingCount,
  });

export async function listReads(db: Db, user: CurrentUser, plateId: string): Promise<ReadSummary[]> {
  await loadVisible(db, plates, plateId, user, 'That plate');
  const rows = await readSummaryQuery(db).where(eq(reads.plateId, plateId)).orderBy(desc(readerFiles.uploadedAt), asc(reads.blockIndex));
  return rows.map(toSummary);
}

export async function getRead(db: Db, user: CurrentUser, readId: string): Promise<ReadData> {
  await loadVisible(db, reads, readId, user, 'That read');
  const [row] = await readSummaryQuery(db).where(eq(reads.id, readId));
  const wells = await db.select().from(wellRecords).where(eq(wellRecords.readId, readId));
  return { ...toSummary(row), wells: wells.map((w) => ({ well: w.well, value: w.value, values: w.values, flag: w.flag })) };
}

export async function rawFile(db: Db, user: CurrentUser, fileId: string) {
  return loadVisible(db, readerFiles, fileId, user, 'That file');
}

export async function deleteRead(db: Db, user: CurrentUser, readId: string) {
  await db.transaction(async (tx) => {
    const read = await loadVisible(tx, reads, readId, user, 'That read');
    await loadEditablePlate(tx, user, read.plateId);
    await tx.delete(reads).where(eq(reads.id, readId));
    const left = await tx.$count(reads, eq(reads.fileId, read.fileId));
    if (left === 0) await tx.delete(readerFiles).where(eq(readerFiles.id, read.fileId));
    await tx.update(plates).set({ updatedAt: new Date() }).where(eq(plates.id, read.plateId));
    await writeAudit(tx, { actorId: user.id, teamId: read.teamId, entity: 'read', entityId: readId, action: 'delete', before: read });
  });
}
