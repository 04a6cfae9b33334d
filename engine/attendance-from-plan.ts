/**
 * Who came to a session lives beside its types, in shared/types/attendance.ts, so the register
 * reads it without loading the engine; engine/index.ts re-exports it.
 * TODO(boundaries): remove once pitch-side imports it from engine/index.ts or shared/types.
 */
export { attendanceFromPlan, leftEarlyIds } from '../shared/types/attendance';
