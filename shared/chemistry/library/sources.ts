// What the source keys of the buffer library mean (SCIENCE.md §2.5 source key). Each value in the
// library carries one of these keys, written exactly as SCIENCE.md §2.5 prints it.
export const SOURCE_KEYS: Readonly<Record<string, string>> = {
  G:
    'Goldberg, Kishore & Lennen 2002, J Phys Chem Ref Data 31:231, as tabulated in the STEEP database file ' +
    'of the open-source ionize library (create_database/data/STEEP_Database.csv, reference code "g"; the ' +
    "code's meaning is inferred, SCIENCE.md §2.5)",
  'Roy 1997':
    'derived from the published pK(T) = A/T + B + C·lnT equations of R. N. Roy and co-workers, 1997 (J Chem Eng ' +
    'Data 42:41 and 42:446; J Chem Thermodyn 29:749 and 29:1323)',
  'Roy 1998': 'R. N. Roy and co-workers 1998 (HEPPSO): published pK2 at 25 and 37 °C (SCIENCE.md §2.5)',
  'Roy 2006':
    'L. N. Roy, R. N. Roy et al. 2006, J Solution Chem 35:605 (Bicine): published pK2 at 25 and 37 °C',
  'Roy 2014': 'R. N. Roy et al. 2014, J Biophys Chem 5:118 (Bis-Tris)',
  VB: 'Vega & Bates 1976, Anal Chem 48:1293',
  cal: 'calorimetric ΔH from Thermochim Acta (2004–2011), as cited in SCIENCE.md §2.5',
  'STEEP ref "c"': 'STEEP database file of the ionize library, reference code "c" (SCIENCE.md §2.5)',
  '[memory]': 'recalled, not checked against a source (SCIENCE.md §2.5): verify before relying on it',
  derived: 'computed in Bellwether from the other values of the same row (SCIENCE.md §2.1)',
};

export const DPKADT_SOURCE = 'SCIENCE.md §2.5 column (= −ΔH/1.7018e6, §2.1)';
export const FORMULA_WEIGHT_SOURCE =
  'computed from the formula with IUPAC standard atomic weights (shared/chemistry/formula.ts)';
export const USEFUL_RANGE_SOURCE = 'pKa ± 1 (common practice, no source)';

export const ROY_REFS = {
  acesChes: 'Roy et al. 1997, J Chem Eng Data 42:41',
  heppsMopso: 'Roy et al. 1997, J Chem Thermodyn 29:1323',
  capsCapso: 'Roy et al. 1997, J Chem Thermodyn 29:749',
  tapso: 'Roy et al. 1997, J Chem Eng Data 42:446',
  bisTris: 'Roy et al. 2014, J Biophys Chem 5:118',
} as const;
