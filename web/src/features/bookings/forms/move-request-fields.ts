import * as yup from 'yup';
import type { AskToMoveRequest } from '@/types/api';

/** Mirrors the API's MoveRequestDto: a note of 1 to 500 characters. */
export const MOVE_REQUEST_NOTE_MAX = 500;

export interface MoveRequestFormValues {
  note: string;
}

export const moveRequestFormFields = ['note'] as const;

export const moveRequestSchema = yup.object({
  note: yup
    .string()
    .trim()
    .required('Say when would suit you better.')
    .max(MOVE_REQUEST_NOTE_MAX, `Use at most ${MOVE_REQUEST_NOTE_MAX} characters.`),
});

export function moveRequestBody(values: MoveRequestFormValues): AskToMoveRequest {
  return { note: values.note.trim() };
}
