import type { StudySummary } from './records-types';

export type RecentUpload = {
  id: string;
  fileName: string;
  uploadedAt: string;
  by: string;
  plateId: string;
  plateName: string;
  studyId: string;
  studyName: string;
};

export type HomeView = {
  counts: { myDrafts: number; awaitingReview: number; approved: number; uploads: number; studies: number };
  myDrafts: StudySummary[];
  awaitingReview: StudySummary[];
  recentlyApproved: StudySummary[];
  recentUploads: RecentUpload[];
};
