import { Op } from 'sequelize';
import type { CardShow } from '@shared/schemas/card';
import type { PublicBuild } from '@shared/schemas/build';
import { numberedCardAddress } from '@shared/gate';
import { config } from '../../config';
import { ConflictError } from '../../errors';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import type { Build } from '../../models/build';
import { loadFullBuildOrThrow } from '../builds/builds';
import { loadCoverImage, renderCardPdf, savedCardSettings } from '../builds/cards';

/** The show block of an entry's card (the show's name, the class and the entry number), and the show's address for its QR code. */
export type EntryCardShow = CardShow & { showSlug: string };
export async function entryCardShow(entry: Entry): Promise<EntryCardShow> {
  if (entry.number == null) throw new ConflictError('This entry has no number yet (it is on the waiting list): its card comes once it has a place.', { number: 'No number yet.' });
  const [event, cls] = await Promise.all([Event.findByPk(entry.eventId, { attributes: ['name', 'slug'] }), EventClass.findByPk(entry.classId, { attributes: ['name'] })]);
  return { showName: event?.name ?? '', className: cls?.name ?? '', entryNumber: String(entry.number), showSlug: event?.slug ?? '' };
}

/** The entry's build, fully loaded, for the caller to present publicly before it reaches the card. */
export const entryCardBuild = (entry: Entry): Promise<Build> => loadFullBuildOrThrow(entry.buildId);

/** The owner's own card (their saved design, paper and choices) carrying the entry's show, class and number. */
export async function renderEntryCard(build: Build, publicBuild: PublicBuild, { showSlug, ...show }: EntryCardShow): Promise<Buffer> {
  const settings = savedCardSettings(build);
  // The QR code names the show and number too, so another show's gate refuses this card by name.
  const qrUrl = numberedCardAddress(config.publicBaseUrl, build.code, showSlug, Number(show.entryNumber));
  return renderCardPdf(publicBuild, settings, { show, cover: await loadCoverImage(publicBuild, settings), qrUrl });
}

export const entryCardFileName = (code: string, number: number) => `placard-${code}-entry-${number}.pdf`;

/** The entries a show reminder goes to: confirmed (paid, with a number), with the owner's address. */
export async function reminderEntries(eventId: number): Promise<Entry[]> {
  return Entry.findAll({
    where: { eventId, status: 'confirmed', number: { [Op.ne]: null } },
    include: [{ model: User, as: 'owner', attributes: ['email', 'name'] }],
    order: [['number', 'ASC']],
  });
}
