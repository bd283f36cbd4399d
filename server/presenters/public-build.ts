import type { PublicBuild, PublicBuildTile } from '@shared/schemas/build';
import { coverPhotoOf } from '@shared/build-sheet/cover';
import type { PublicBuildResponse } from '@shared/schemas/card';
import { publicSections, publicWeight } from '@shared/schemas/public-build-sections';
import { computeKeyFigures } from '@shared/build-sheet/key-figures';
import { engineLine } from '@shared/build-sheet/spec-lines';
import { shownEngineering } from '@shared/build-sheet/engineering-shown';
import type { Build } from '../models/build';
import { presentPhoto } from './photo';
import { publicBuildUrl } from './build';

/**
 * The public allow-list of a build: every field is named here, so a column added to the model
 * later stays private until someone adds it on purpose. The owner appears by display name only
 * (`loadFullBuild` reads no other field of the owner). The stored JSON (sections, weight) goes
 * through the public schemas, which keep only the keys they name.
 */
export function presentPublicBuild(build: Build): PublicBuild {
  return {
    code: build.code,
    url: publicBuildUrl(build.code),
    title: build.title,
    modelYear: build.modelYear,
    bodyOrigin: build.bodyOrigin,
    style: build.style,
    story: build.story,
    ownerName: build.owner?.name ?? '',
    weight: publicWeight(build.weight),
    sections: publicSections(build.sections ?? []),
    credits: (build.credits ?? []).map((c) => ({ role: c.role, name: c.name })),
    photos: (build.photos ?? []).map(presentPhoto),
    dynoRuns: (build.dynoRuns ?? []).map(({ data: d }) => ({
      date: d.date,
      facility: d.facility,
      standard: d.standard,
      measuredAt: d.measuredAt,
      powerUnit: d.powerUnit,
      torqueUnit: d.torqueUnit,
      peakPower: d.peakPower,
      peakPowerRpm: d.peakPowerRpm,
      peakTorque: d.peakTorque,
      peakTorqueRpm: d.peakTorqueRpm,
      curve: d.curve.map((p) => ({ rpm: p.rpm, power: p.power, torque: p.torque })),
      note: d.note,
    })),
    weighIns: (build.weighIns ?? []).map(({ data: w }) => ({
      date: w.date,
      unit: w.unit,
      leftFront: w.leftFront,
      rightFront: w.rightFront,
      leftRear: w.leftRear,
      rightRear: w.rightRear,
      withDriver: w.withDriver,
      fuelLevel: w.fuelLevel,
      note: w.note,
      ...(w.tilt ? { tilt: { raisedAxle: w.tilt.raisedAxle, raisedHeightMm: w.tilt.raisedHeightMm, wheelCentreHeightMm: w.tilt.wheelCentreHeightMm, leftRaised: w.tilt.leftRaised, rightRaised: w.tilt.rightRaised } } : {}),
    })),
    updatedAt: build.updatedAt.toISOString(),
  };
}

/** The JSON twin of /c/<code>: the same public fields, plus the figures the page works out. */
export function presentPublicBuildResponse(b: PublicBuild): PublicBuildResponse {
  const e = b.sections.engine;
  const line = e ? { metric: engineLine(e, 'metric'), imperial: engineLine(e, 'imperial') } : null;
  const metric = shownEngineering(b, 'metric');
  const imperial = shownEngineering(b, 'imperial');
  const engineering = metric && imperial ? { metric: metric.figures, imperial: imperial.figures, caution: metric.caution } : null;
  return { build: { ...b, keyFigures: computeKeyFigures(b), engineLine: line && (line.metric || line.imperial) ? line : null, engineering } };
}

/** A published build as a tile: title, year, style, cover and its public address; nothing else. */
export function presentPublicBuildTile(build: Build): PublicBuildTile {
  const cover = coverPhotoOf(build.photos);
  return { code: build.code, url: publicBuildUrl(build.code), title: build.title, modelYear: build.modelYear, style: build.style, cover: cover ? presentPhoto(cover) : null };
}
