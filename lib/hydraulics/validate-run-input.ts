/** Checks a RunInput and throws an Error whose message starts with the offending field. */
import type { RunInput } from "./types";

const METHODS = ["D5887", "D6766", "D5084"] as const;

const isNum = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

function nonNegative(v: unknown, field: string): void {
  if (!isNum(v) || v < 0) throw new Error(`${field} must be a finite number ≥ 0, got ${String(v)}`);
}

function positive(v: unknown, field: string): void {
  if (!isNum(v) || v <= 0) throw new Error(`${field} must be a positive finite number, got ${String(v)}`);
}

function ph(v: unknown, field: string): void {
  if (!(isNum(v) && v >= 0 && v <= 14)) throw new Error(`${field} must be between 0 and 14, got ${String(v)}`);
}

/** Throws on the first problem found; the message names the field, e.g. "readings[3].elapsedS". */
export function validateRunInput(input: RunInput): void {
  if (input === null || typeof input !== "object") throw new Error("input must be an object");
  if (!METHODS.includes(input.method)) {
    throw new Error(`method must be one of ${METHODS.join(", ")}, got ${String(input.method)}`);
  }
  const sp = input.specimen;
  if (sp === null || typeof sp !== "object") throw new Error("specimen must be an object");
  positive(sp.diameterMm, "specimen.diameterMm");
  positive(sp.thicknessMm, "specimen.thicknessMm");
  if (sp.porosity !== undefined && !(isNum(sp.porosity) && sp.porosity > 0 && sp.porosity < 1)) {
    throw new Error(`specimen.porosity must be between 0 and 1, got ${String(sp.porosity)}`);
  }
  if (sp.bentoniteMassPerAreaKgPerM2 !== undefined) positive(sp.bentoniteMassPerAreaKgPerM2, "specimen.bentoniteMassPerAreaKgPerM2");
  if (sp.specificGravity !== undefined) positive(sp.specificGravity, "specimen.specificGravity");

  const rs = input.readings;
  if (!Array.isArray(rs) || rs.length < 2) {
    throw new Error(`readings must hold at least 2 readings, got ${Array.isArray(rs) ? rs.length : String(rs)}`);
  }
  // Levels are given on every reading or on none: a head that switched basis mid-run would be meaningless.
  const withLevels = rs[0] !== null && typeof rs[0] === "object" && (rs[0].inflowLevelMm !== undefined || rs[0].outflowLevelMm !== undefined);
  // Field names are built only on failure: this loop runs for every reading of long runs.
  for (let i = 0; i < rs.length; i++) {
    const r = rs[i];
    if (r === null || typeof r !== "object") throw new Error(`readings[${i}] must be an object`);
    if (!(isNum(r.elapsedS) && r.elapsedS >= 0)) nonNegative(r.elapsedS, `readings[${i}].elapsedS`);
    if (!(isNum(r.inflowMl) && r.inflowMl >= 0)) nonNegative(r.inflowMl, `readings[${i}].inflowMl`);
    if (!(isNum(r.outflowMl) && r.outflowMl >= 0)) nonNegative(r.outflowMl, `readings[${i}].outflowMl`);
    if (!(isNum(r.headKPa) && r.headKPa > 0)) positive(r.headKPa, `readings[${i}].headKPa`);
    if (!(isNum(r.temperatureC) && r.temperatureC >= 0 && r.temperatureC <= 40)) {
      throw new Error(`readings[${i}].temperatureC must be between 0 and 40 °C, got ${String(r.temperatureC)}`);
    }
    if (r.influentEcMsPerM !== undefined) nonNegative(r.influentEcMsPerM, `readings[${i}].influentEcMsPerM`);
    if (r.effluentEcMsPerM !== undefined) nonNegative(r.effluentEcMsPerM, `readings[${i}].effluentEcMsPerM`);
    if (r.influentPh !== undefined) ph(r.influentPh, `readings[${i}].influentPh`);
    if (r.effluentPh !== undefined) ph(r.effluentPh, `readings[${i}].effluentPh`);
    checkLevels(r, i, withLevels);
    if (r.afterRefill !== undefined) {
      if (r.afterRefill !== true) throw new Error(`readings[${i}].afterRefill must be true or left out, got ${String(r.afterRefill)}`);
      if (i === 0) throw new Error("readings[0].afterRefill: the first reading cannot follow a refill; a refill is recorded by the readings just before and just after it");
    }
    if (i > 0) {
      const prev = (rs[i - 1] as { elapsedS: number }).elapsedS;
      if (!(r.elapsedS > prev)) {
        throw new Error(`readings[${i}].elapsedS must be greater than readings[${i - 1}].elapsedS (got ${r.elapsedS} after ${prev})`);
      }
    }
  }
  const b = input.burettes;
  if (b !== undefined) {
    if (b === null || typeof b !== "object") throw new Error("burettes must be an object");
    positive(b.inflowAreaMm2, "burettes.inflowAreaMm2");
    positive(b.outflowAreaMm2, "burettes.outflowAreaMm2");
    if (b.initialLevelDifferenceMm !== undefined || !withLevels) {
      if (!isNum(b.initialLevelDifferenceMm)) {
        throw new Error(`burettes.initialLevelDifferenceMm must be a finite number${withLevels ? "" : " when the readings carry no burette levels"}, got ${String(b.initialLevelDifferenceMm)}`);
      }
    }
    if (!withLevels) {
      const refill = rs.findIndex((r) => r.afterRefill === true);
      if (refill >= 0) throw new Error(`readings[${refill}].afterRefill: a refill changes the burette levels, so falling-head burettes need the readings' inflowLevelMm and outflowLevelMm`);
    }
  }
}

function checkLevels(r: RunInput["readings"][number], i: number, withLevels: boolean): void {
  const has = r.inflowLevelMm !== undefined || r.outflowLevelMm !== undefined;
  if (has !== withLevels) {
    throw new Error(
      withLevels
        ? `readings[${i}].inflowLevelMm and outflowLevelMm are missing, but readings[0] has burette levels; give levels on every reading or on none`
        : `readings[${i}].inflowLevelMm and outflowLevelMm are given, but readings[0] has no burette levels; give levels on every reading or on none`,
    );
  }
  if (!has) return;
  if (!isNum(r.inflowLevelMm)) throw new Error(`readings[${i}].inflowLevelMm must be a finite number, got ${String(r.inflowLevelMm)}`);
  if (!isNum(r.outflowLevelMm)) throw new Error(`readings[${i}].outflowLevelMm must be a finite number, got ${String(r.outflowLevelMm)}`);
}
