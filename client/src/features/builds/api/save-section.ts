import type { OwnerBuild } from '@shared/schemas/build';
import type { SectionKind, Sections } from '@shared/schemas/build-sections';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

/** Replaces one spec section with the whole object sent. */
export const saveSection = <K extends SectionKind>(id: number, kind: K, section: NonNullable<Sections[K]>) =>
  api<{ build: OwnerBuild }>(`/api/builds/${id}/sections/${kind}`, { method: 'PUT', body: section, keepalive: true });

export const useSaveSection = <K extends SectionKind>(id: number, kind: K) =>
  useBuildMutation(id, (section: NonNullable<Sections[K]>) => saveSection(id, kind, section));
