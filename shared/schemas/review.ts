import { z } from 'zod';
import { optionalText, text } from './common';

export const studyEventKinds = ['comment', 'submit', 'withdraw', 'approve', 'return', 'unlock'] as const;
export type StudyEventKind = (typeof studyEventKinds)[number];

export const submitSchema = z.object({ message: optionalText(4000, 'Message') });
export const approveSchema = z.object({ comment: optionalText(4000, 'Comment') });
export const returnSchema = z.object({ comment: text(4000, 'Comment') });
export const unlockSchema = z.object({ reason: text(4000, 'Reason') });
export const commentSchema = z.object({ body: text(4000, 'Comment') });

export type StudyEvent = {
  id: string;
  kind: StudyEventKind;
  body: string;
  createdAt: string;
  author: { id: string; name: string; role: string };
};
