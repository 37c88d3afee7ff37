import type { MapCheck } from '../plate-map/checks';
import type { PlateMap } from '../plate-map/schema';

export type PlateSummary = {
  id: string;
  studyId: string;
  teamId: string;
  name: string;
  format: 96 | 384;
  version: number;
  updatedAt: string;
  readCount: number;
};

export type ReadSummary = {
  id: string;
  fileId: string;
  fileName: string;
  sha256: string;
  kind: 'endpoint' | 'kinetic';
  label: string;
  wavelengthNm: number | null;
  sheet: string;
  location: string;
  timesS: number[] | null;
  uploadedBy: string;
  uploadedAt: string;
  wellCount: number;
  missingCount: number;
};

export type PlateDetail = PlateSummary & { map: PlateMap; checks: MapCheck[]; reads: ReadSummary[] };

export type PlateTemplate = { id: string; teamId: string; name: string; format: 96 | 384; map: PlateMap; createdAt: string };

export type BlockPreview = {
  index: number;
  kind: 'endpoint' | 'kinetic';
  plateFormat: 96 | 384;
  sheet: string;
  label: string;
  location: string;
  layout: string;
  wavelengthNm: number | null;
  /** Fluorescence: the excitation wavelength, when the label gives one (wavelengthNm is then the emission). */
  excitationNm: number | null;
  wellsWithValues: number;
  missing: number;
  flags: Record<string, string>;
  timesS: number[] | null;
  /** One number per well for a heat map: the end-point value or the last kinetic value. */
  preview: Record<string, number | null>;
  formatMatchesPlate: boolean;
};

export type ImportPreview = {
  fileName: string;
  sizeBytes: number;
  sha256: string;
  fileType: 'xlsx' | 'text';
  blocks: BlockPreview[];
  notes: { sheet?: string; cell?: string; message: string }[];
  /** Earlier imports of the very same bytes in this team. */
  duplicates: { plateId: string; plateName: string; uploadedAt: string; uploadedBy: string }[];
};

export type WellData = { well: string; value: number | null; values: (number | null)[] | null; flag: string | null };
export type ReadData = ReadSummary & { wells: WellData[] };
