// The recipe sheet as an xlsx workbook (exceljs): one row per buffer to make, with its
// components, then the series' cautions and the general safety note.
import ExcelJS from 'exceljs';
import { SAFETY_CAUTION, type Recipe } from '../../../shared/chemistry';
import type { DesignedSeries } from './series';

const round = (value: number | null | undefined, digits: number) => (value == null ? null : Number(value.toFixed(digits)));

function components(recipe: Recipe) {
  return recipe.components
    .map((c) => {
      const amount = c.grams != null ? `${c.grams.toFixed(4)} g` : c.volume != null ? `${(c.volume * 1000).toFixed(3)} mL` : `${(c.moles * 1000).toFixed(4)} mmol`;
      const stock = c.stockConc != null && c.grams == null ? ` of ${c.stockConc} M` : '';
      return `${c.name}: ${amount}${stock}`;
    })
    .join('; ');
}

export async function recipeWorkbook(name: string, series: DesignedSeries, volumeMl: number): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = 'Bellwether';
  const sheet = book.addWorksheet('Recipes');
  sheet.columns = [
    { header: 'pH (assay)', key: 'pH', width: 10 },
    { header: 'Buffer system', key: 'system', width: 22 },
    { header: 'Role', key: 'role', width: 10 },
    { header: 'Method', key: 'method', width: 9 },
    { header: `Components for ${volumeMl} mL`, key: 'components', width: 70 },
    { header: 'pK″ at assay', key: 'pKapp', width: 11 },
    { header: 'Ionic strength (M)', key: 'I', width: 16 },
    { header: 'Salt added (mM)', key: 'salt', width: 14 },
    { header: 'β (mM/pH)', key: 'beta', width: 11 },
    { header: `Set pH at ${series.makeTemperatureC} °C`, key: 'setPH', width: 14 },
    { header: 'Well pH', key: 'wellPH', width: 9 },
    { header: 'Notes', key: 'notes', width: 60 },
  ];
  sheet.getRow(1).font = { bold: true };
  for (const point of series.points) {
    const rows: { role: string; recipe: Recipe | null; capacity: number | null }[] = [{ role: 'main', recipe: point.recipe, capacity: point.capacity }];
    if (point.overlap) rows.push({ role: 'overlap', recipe: point.overlap.recipe, capacity: point.overlap.capacity });
    for (const { role, recipe, capacity } of rows) {
      sheet.addRow({
        pH: point.pH,
        system: recipe?.systemName ?? '—',
        role: series.overridden.includes(point.pH.toFixed(2)) && role === 'main' ? 'chosen' : role,
        method: recipe?.method ?? '',
        components: recipe ? components(recipe) : 'no buffer within one pH unit',
        pKapp: round(recipe?.ionization.pKapp, 3),
        I: round(recipe?.ionicStrength, 4),
        salt: recipe ? round(recipe.saltConc * 1000, 2) : null,
        beta: capacity == null ? null : round(capacity * 1000, 2),
        setPH: role === 'main' ? round(point.makeUp?.setPH, 2) : null,
        wellPH: role === 'main' ? round(point.well?.pH, 2) : null,
        notes: [...(point.weak && role === 'main' ? ['weak capacity'] : []), ...(role === 'main' ? point.warnings : [])].join(' '),
      });
    }
  }
  const notes = book.addWorksheet('Cautions');
  notes.columns = [{ header: 'Caution', key: 'text', width: 120 }];
  notes.getRow(1).font = { bold: true };
  for (const text of [...series.cautions, ...series.warnings, SAFETY_CAUTION, 'Results are research data, not a release test of any product.']) {
    notes.addRow({ text });
  }
  const about = book.addWorksheet('About');
  about.addRow(['Series', name]);
  about.addRow(['Assay temperature (°C)', series.assayTemperatureC]);
  about.addRow(['Made up at (°C)', series.makeTemperatureC]);
  about.addRow(['Computed by', 'Bellwether buffer designer (Davies activity corrections, Goldberg temperature dependence)']);
  return Buffer.from(await book.xlsx.writeBuffer());
}
