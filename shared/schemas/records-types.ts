// Response shapes of the records API (dates as ISO strings).
import type { StudyStatus } from './studies';

type Stamped = { id: string; teamId: string; createdAt: string; updatedAt: string };

export type Preparation = Stamped & {
  variantId: string;
  lot: string;
  proteinMgPerMl: number;
  preparedOn: string;
  storageBuffer: string;
  notes: string;
};

export type Variant = Stamped & {
  enzymeId: string;
  name: string;
  mutations: string;
  isParent: boolean;
  notes: string;
};

export type VariantWithPreparations = Variant & { preparations: Preparation[] };

export type Enzyme = Stamped & { name: string; organism: string; notes: string; createdBy: string };
export type EnzymeSummary = Enzyme & { teamName: string; variantCount: number };
export type EnzymeDetail = Enzyme & { teamName: string; variants: VariantWithPreparations[]; studyCount: number };

export type Assay = Stamped & {
  name: string;
  substrate: string;
  substrateMm: number;
  kmMm: number | null;
  substrateRegime: 'saturating' | 'sub-saturating' | 'unknown';
  readMode: 'endpoint' | 'kinetic';
  detection: 'absorbance' | 'fluorescence';
  wavelengthNm: number;
  emissionNm: number | null;
  quantitation: 'extinction' | 'standard-curve';
  extinctionCoefficient: number | null;
  extinctionUnit: 'M-1cm-1' | 'mM-1cm-1';
  pathLengthCm: number | null;
  wellVolumeUl: number;
  temperatureC: number;
  stopSolution: string;
  chromophorePka: number | null;
  notes: string;
  createdBy: string;
};
export type AssayDetail = Assay & { teamName: string; cautions: string[]; studyCount: number };

export type StudySummary = Stamped & {
  name: string;
  status: StudyStatus;
  enzymeId: string;
  enzymeName: string;
  assayId: string;
  assayName: string;
  assayReadMode: 'endpoint' | 'kinetic';
  assayQuantitation: 'extinction' | 'standard-curve';
  ownerId: string;
  ownerName: string;
  teamName: string;
  variantCount: number;
  bufferSeriesId: string | null;
};

export type StudyDetail = StudySummary & {
  notes: string;
  version: number;
  referenceVariantId: string;
  variants: Variant[];
};
