// Wells and variant ids for the plate-editor tests (invented ids; the app's own empty assignment).
import type { WellAssignment } from '@shared/plate-map/schema';
import { blankAssignment } from '@/features/plates/utils/edit-map';

export const WT = '00000000-0000-4000-8000-000000000001';
export const D92N = '00000000-0000-4000-8000-000000000002';

/** A sample well with only the given fields set. */
export const well = (over: Partial<WellAssignment>): WellAssignment => ({
  ...blankAssignment('sample'),
  ...over,
});
