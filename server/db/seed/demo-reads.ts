// Generated reader files for the demo studies. Each variant gets invented "true" bell-curve
// parameters; every well's trace follows them with a little curvature and seeded noise. The files
// are written the way plate readers commonly export (a kinetic table with a Time column and one
// column per well; an end-point grid with row letters and column numbers) and say they are generated.
import ExcelJS from 'exceljs';
import { mulberry32 } from '../../../shared/fitting';
import type { PlateMap } from '../../../shared/plate-map/schema';

export type TrueProfile = { V: number; pKa1: number; pKa2: number };

/** Invented parameters (A410 per second at the optimum is V · 1e-3). Demo only. */
export const demoTruth: Record<string, TrueProfile> = {
  'FR1-WT': { V: 2.0, pKa1: 3.7, pKa2: 6.3 },
  'FR1-D92N': { V: 1.8, pKa1: 3.0, pKa2: 6.2 },
  'FR1-E228Q': { V: 2.1, pKa1: 3.68, pKa2: 6.32 },
  'FR1-D92N/S110A': { V: 1.5, pKa1: 2.95, pKa2: 6.0 },
  'FR1-K301E': { V: 1.9, pKa1: 3.72, pKa2: 6.3 },
};

/** The two-pKa bell (SCIENCE.md §1.2). */
export const bell = (p: TrueProfile, pH: number) => p.V / (1 + 10 ** (p.pKa1 - pH) + 10 ** (pH - p.pKa2));

const rows = 'ABCDEFGH';

/**
 * A 96-well map: pH points across columns 1–12; rows A–C the first variant (replicates 1–3), D–F
 * the second, G blanks without enzyme, H buffer only.
 */
export function demoPlateMap(pHs: number[], buffers: (string | null)[], variantIds: [string, string]): PlateMap {
  const wells: PlateMap['wells'] = {};
  pHs.slice(0, 12).forEach((pH, c) => {
    const buffer = buffers[c] ?? null;
    const base = { pH, buffer, concentrationUm: null };
    for (let r = 0; r < 6; r += 1) {
      wells[`${rows[r]}${c + 1}`] = { ...base, role: 'sample', variantId: variantIds[r < 3 ? 0 : 1], replicate: (r % 3) + 1 };
    }
    wells[`G${c + 1}`] = { ...base, role: 'blank', variantId: null, replicate: 1 };
    wells[`H${c + 1}`] = { ...base, role: 'buffer', variantId: null, replicate: 1 };
  });
  return { wells, replicatesRequired: 3 };
}

type Gauss = () => number;
function gaussian(seed: number): Gauss {
  const random = mulberry32(seed);
  return () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

/** Initial slope (A/s) of each mapped well, from the truth of its variant; blanks drift slightly. */
function slopes(map: PlateMap, truthOf: (variantId: string) => TrueProfile | undefined, noise: Gauss) {
  const out: Record<string, number> = {};
  for (const [well, w] of Object.entries(map.wells)) {
    const truth = w.variantId ? truthOf(w.variantId) : undefined;
    const enzyme = w.role === 'sample' && truth && w.pH != null ? bell(truth, w.pH) * 1e-3 : 0;
    const spontaneous = w.role === 'blank' && w.pH != null ? 2e-5 * (1 + 0.2 * (4 - w.pH)) : 0;
    out[well] = Math.max(0, enzyme * (1 + 0.04 * noise()) + Math.max(0, spontaneous));
  }
  return out;
}

/** A kinetic workbook: 31 reads 20 s apart, slight substrate-depletion curvature, 0.003 A noise. */
export async function kineticWorkbook(plateName: string, map: PlateMap, truthOf: (id: string) => TrueProfile | undefined, seed: number, outlierWell?: string) {
  const noise = gaussian(seed);
  const slope = slopes(map, truthOf, noise);
  // A generated outlier: one well runs 1.8 times too fast (as a bubble or a pipetting error would).
  if (outlierWell && slope[outlierWell] !== undefined) slope[outlierWell] *= 1.8;
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet('Kinetic 410 nm');
  sheet.addRow(['Generated demo data (Bellwether) — not a real instrument export']);
  sheet.addRow(['Plate', plateName]);
  sheet.addRow(['Absorbance 410 nm, read every 20 s at 37 °C']);
  sheet.addRow([]);
  const wells = Object.keys(map.wells);
  const allWells = [...rows].flatMap((r) => Array.from({ length: 12 }, (_, c) => `${r}${c + 1}`));
  sheet.addRow(['Time [s]', 'Temperature [°C]', ...allWells]);
  for (let i = 0; i <= 30; i += 1) {
    const t = i * 20;
    const values = allWells.map((well) => {
      const k = wells.includes(well) ? slope[well] : 0;
      // Product formation slows as substrate is used: A = A0 + k·t·(1 − k·t/3).
      const signal = 0.045 + k * t * (1 - (k * t) / 3) + 0.003 * noise();
      return Number(signal.toFixed(4));
    });
    sheet.addRow([t, Number((37 + 0.05 * noise()).toFixed(2)), ...values]);
  }
  return Buffer.from(await book.xlsx.writeBuffer());
}

/** An end-point grid (csv): product after a fixed time, stopped with base; one outlier if asked. */
export function endpointCsv(label: string, map: PlateMap, truthOf: (id: string) => TrueProfile | undefined, seed: number, outlierWell?: string) {
  const noise = gaussian(seed);
  const slope = slopes(map, truthOf, noise);
  const lines = [`# Generated demo data (Bellwether) — not a real instrument export`, label, ['', ...Array.from({ length: 12 }, (_, c) => c + 1)].join(',')];
  for (const r of rows) {
    const cells = Array.from({ length: 12 }, (_, c) => {
      const well = `${r}${c + 1}`;
      const product = (slope[well] ?? 0) * 600 * (well === outlierWell ? 1.9 : 1);
      return (0.05 + product + 0.004 * noise()).toFixed(4);
    });
    lines.push([r, ...cells].join(','));
  }
  return Buffer.from(`${lines.join('\n')}\n`, 'utf8');
}
