// The benchmark workbook: 384 wells × 120 kinetic reads with time and temperature columns.
// GENERATED DATA (seeded), not a measurement.
import ExcelJS from 'exceljs';

export const READS = 120;
const LETTERS = 'ABCDEFGHIJKLMNOP';

export async function makeWorkbook(): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Kinetic 405');
  sheet.getCell('A1').value = 'Generated test data for the Bellwether import benchmark (not a measurement)';
  sheet.getCell('A2').value = 'Absorbance 405 nm';
  const wells: string[] = [];
  for (let r = 0; r < 16; r++) for (let c = 1; c <= 24; c++) wells.push(`${LETTERS[r]}${c}`);
  sheet.getRow(4).values = ['Time [s]', 'Temp [°C]', ...wells];
  let seed = 42;
  const rand = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
  const slopes = wells.map(() => 0.0001 + 0.002 * rand());
  for (let k = 0; k < READS; k++) {
    const t = k * 30;
    sheet.getRow(5 + k).values = [
      t,
      37 + 0.1 * rand(),
      ...slopes.map((s) => Math.round((0.05 + s * t + 0.002 * rand()) * 1e4) / 1e4),
    ];
  }
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

