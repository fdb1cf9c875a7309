import { z } from 'zod';
import { recordingKindSchema } from './recording';

/** A connected robot as the recorder sees it, and the recording it is making (if any). */
export const recorderRobotSchema = z.object({
  robot: z.string(),
  mode: z.enum(['disabled', 'auto', 'teleop']).nullable(),
  recording: z
    .object({
      /** Null for the first moment of a recording, until its first batch is stored. */
      recordingId: z.string().uuid().nullable(),
      kind: recordingKindSchema,
      /** Started by hand (`POST /api/recorder/start`) rather than by the robot's mode. */
      isManual: z.boolean(),
    })
    .nullable(),
});
export type RecorderRobot = z.infer<typeof recorderRobotSchema>;

export const recorderStatusSchema = z.object({ robots: z.array(recorderRobotSchema) });
export type RecorderStatus = z.infer<typeof recorderStatusSchema>;

export const recorderCommandSchema = z.object({
  robot: z.string({ message: 'Name the robot' }).trim().min(1, 'Name the robot').max(64),
});
export type RecorderCommand = z.infer<typeof recorderCommandSchema>;

export const recorderStoppedSchema = z.object({ recordingId: z.string().uuid().nullable() });
