import { createHash } from 'node:crypto';
import { createElement } from 'react';
import { Op } from 'sequelize';
import { renderToBuffer } from '@react-pdf/renderer';
import { CARD_PRINT_ENTRY_STATUSES } from '@shared/schemas/card-print';
import { headlineOf } from '@shared/build-sheet/headline';
import { numberedCardAddress } from '@shared/gate';
import { layoutNumberedCard, NumberedCardsDocument, NUMBERED_CARD_DESIGN, type NumberedCardContent } from '@templates/cards/numbered-card';
import { registerCardFonts } from '@templates/cards/fonts';
import { config } from '../../config';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { EventClass } from '../../models/event-class';
import { storage } from '../../storage/index';
import { cardCacheKey } from '../../storage/keys';
import { qrMatrix, shortUrlOf } from '../builds/cards';

/** One numbered card of a bulk print: which entry, what it prints, and the key of its cached page. */
export type NumberedCard = { entryId: number; number: number; content: NumberedCardContent; hash: string };

/**
 * The cache key of a card: a hash of everything it prints and of the design that draws it, so the
 * same content in the same design is never drawn twice, and any edit (a new title, another class, a
 * renamed show) or a new design makes a new key.
 */
export const numberedCardHash = (content: NumberedCardContent) => createHash('sha256').update(JSON.stringify([NUMBERED_CARD_DESIGN, 'letter', content])).digest('hex');

/** The confirmed entries of a show (or of one class), in number order, as the cards they print. Public fields only. */
export async function numberedCardsOf(event: { id: number; name: string; slug: string }, classId: number | null, entryId?: number): Promise<NumberedCard[]> {
  const entries = await Entry.findAll({
    where: { eventId: event.id, status: { [Op.in]: [...CARD_PRINT_ENTRY_STATUSES] }, number: { [Op.ne]: null }, ...(classId ? { classId } : {}), ...(entryId ? { id: entryId } : {}) },
    attributes: ['id', 'number'],
    include: [
      { model: Build, as: 'build', attributes: ['title', 'modelYear', 'bodyOrigin', 'code'] },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [['number', 'ASC']],
  });
  return entries.map((e) => {
    const build = e.build!;
    const { heading, kicker } = headlineOf(build);
    // The QR code opens the public build page with this show first (a car may be in two shows), marked with
    // the show and the number so a gate tells a card of another show from its own; the printed short address stays the plain page.
    const url = `${config.publicBaseUrl}/c/${build.code}`;
    const content: NumberedCardContent = {
      show: { showName: event.name, className: e.eventClass?.name ?? '', entryNumber: String(e.number) },
      heading,
      name: kicker,
      qr: qrMatrix(numberedCardAddress(config.publicBaseUrl, build.code, event.slug, e.number!)),
      shortUrl: shortUrlOf(url),
    };
    return { entryId: e.id, number: e.number!, content, hash: numberedCardHash(content) };
  });
}

/** Draws cards as pages of one document (one page each, in order). */
export async function renderNumberedCards(contents: NumberedCardContent[], title: string): Promise<Buffer> {
  registerCardFonts();
  const pages = contents.map((c, i) => ({ ...layoutNumberedCard(c), key: String(i) }));
  const doc = createElement(NumberedCardsDocument, { pages, title });
  return renderToBuffer(doc as Parameters<typeof renderToBuffer>[0]);
}

async function readAll(key: string): Promise<Buffer | null> {
  const object = await storage.get(key);
  if (!object) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of object.body) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** A card's one-page PDF from the cache, drawn and stored first when it is not there. `drawn` says which. */
export async function cachedNumberedCard(card: NumberedCard): Promise<{ pdf: Buffer; drawn: boolean }> {
  const key = cardCacheKey(card.hash);
  const cached = await readAll(key);
  if (cached) return { pdf: cached, drawn: false };
  const pdf = await renderNumberedCards([card.content], `Entry ${card.number}`);
  await storage.put(key, pdf, 'application/pdf');
  return { pdf, drawn: true };
}

export { readAll as readStoredFile };
