/**
 * Input checks shared by the report builders.
 */
import { InputError } from "../core/index.js";
import type { HeaterStudy } from "../study/index.js";

/** Throws InputError unless `study` looks like a result of studyHeater. */
export function requireStudy(where: string, study: unknown): void {
  const s = study as Partial<HeaterStudy> | null;
  if (typeof s !== "object" || s === null || typeof s.description !== "object" || typeof s.operating !== "object" || typeof s.emptyCoil !== "object") {
    throw new InputError(where, "study", study, "", "a result of studyHeater");
  }
}
