// What the plate screens need to know about their study: its status (editable or not), team,
// variants, the assay's quantitation (standard curve or not) and the buffer series' pH points.
// Three reads (study, assay, buffer series) composed into one small answer, because the editor
// needs all of them before it can check a map; the study pages have their own, fuller queries.
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SeriesDetail } from '@shared/schemas/buffer-series';
import type { AssayDetail, StudyDetail } from '@shared/schemas/records-types';
import type { StudyStatus } from '@shared/schemas/studies';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export type StudyVariant = { id: string; name: string; mutations: string; isParent: boolean };
export type PhPoint = { pH: number; buffer: string | null; bufferName: string | null };

export type PlateStudyContext = {
  id: string;
  name: string;
  teamId: string;
  status: StudyStatus;
  variants: StudyVariant[];
  needsStandardCurve: boolean;
  assayName: string;
  seriesName: string | null;
  /** The buffer series' points in ascending pH (empty when the study has no series yet). */
  phPoints: PhPoint[];
};

const id = encodeURIComponent;

export async function getStudyContext(studyId: string, signal?: AbortSignal): Promise<PlateStudyContext> {
  const study = await api.get<StudyDetail>(`/studies/${id(studyId)}`, undefined, signal);
  const [assay, series] = await Promise.all([
    api.get<AssayDetail>(`/assays/${id(study.assayId)}`, undefined, signal),
    study.bufferSeriesId
      ? api.get<SeriesDetail>(`/buffer-series/${id(study.bufferSeriesId)}`, undefined, signal)
      : Promise.resolve(null),
  ]);
  const phPoints = (series?.design.points ?? [])
    .map((p) => ({
      pH: p.pH,
      buffer: p.proposal?.systemId ?? null,
      bufferName: p.proposal?.systemName ?? null,
    }))
    .sort((a, b) => a.pH - b.pH);
  return {
    id: study.id,
    name: study.name,
    teamId: study.teamId,
    status: study.status,
    variants: study.variants.map((v) => ({
      id: v.id,
      name: v.name,
      mutations: v.mutations,
      isParent: v.isParent,
    })),
    needsStandardCurve: assay.quantitation === 'standard-curve',
    assayName: assay.name,
    seriesName: series?.name ?? null,
    phPoints,
  };
}

export const getStudyContextQueryOptions = (studyId: string) =>
  queryOptions({
    queryKey: plateKeys.studyContext(studyId),
    queryFn: ({ signal }) => getStudyContext(studyId, signal),
    // The study's status decides whether maps may change: ask again on every visit.
    staleTime: 0,
  });

export function useStudyContext(studyId: string) {
  return useQuery(getStudyContextQueryOptions(studyId));
}
