import { availableFigures } from '@shared/build-sheet/key-figures';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import type { CardSettings, CardSettingsResponse } from '@shared/schemas/card';
import type { Build } from '../models/build';
import { publicBuildUrl } from './build';
import { presentPublicBuild } from './public-build';

/** What the card designer opens with: the settings, and the build as a card can print it (its public face only). */
export function presentCardSettings(build: Build, settings: CardSettings, highlights: CardSettingsResponse['highlights']): CardSettingsResponse {
  const face = presentPublicBuild(build);
  return {
    settings,
    saved: build.cardSettings != null,
    build: {
      id: build.id,
      code: build.code,
      title: build.title,
      published: build.published,
      publicUrl: publicBuildUrl(build.code),
      sections: SECTION_KINDS.filter((kind) => face.sections[kind]),
      figures: availableFigures(face),
    },
    highlights: highlights.map((h) => ({ kind: h.kind, id: h.id, label: h.label })),
  };
}
