import type { BufferSystem } from '../chemistry';

export type BufferStepSummary = { label: string; pKa25: number; zAcid: number; dpKadT: number | null; pKa37: number | null };

export type BufferSummary = {
  id: string;
  name: string;
  aliases: string[];
  builtIn: boolean;
  steps: BufferStepSummary[];
  designerDefault: boolean;
};

export type BufferDetail = BufferSummary & { system: BufferSystem; createdAt: string; updatedAt: string };
