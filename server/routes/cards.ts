import { Router } from 'express';
import { IdParamSchema } from '@shared/schemas/params';
import { replaceBody } from '@shared/schemas/body';
import { CARD_LEFT_OFF_HEADER, CardQuerySchema, CardSettingsSchema } from '@shared/schemas/card';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild, loadFullBuildOrThrow } from '../services/builds/builds';
import { loadCoverImage, qrPng, qrSvg, renderCard, saveCardSettings, savedCardSettings, settingsFromQuery, showFromQuery } from '../services/builds/cards';
import { publicBuildUrl } from '../presenters/build';
import { presentPublicBuild } from '../presenters/public-build';
import { presentCardSettings } from '../presenters/card-settings';
import { cardHighlightChoices, cardHighlightWords, checkCardHighlight } from '../services/builds/card-highlight';

/** The owner's windshield cards and QR codes (mounted under /api, after session and CSRF). */
export const cardsRouter = Router();

const CardSettingsReplaceSchema = replaceBody(CardSettingsSchema);

cardsRouter.get('/builds/:id/card-settings', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await loadFullBuildOrThrow(id);
  authorizeBuild(currentUser(req), 'edit', build);
  res.json(presentCardSettings(build, savedCardSettings(build), await cardHighlightChoices(build.id)));
});

cardsRouter.put('/builds/:id/card-settings', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const settings = parseBody(req, CardSettingsReplaceSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  await checkCardHighlight(build.id, settings.highlight);
  await saveCardSettings(build, settings);
  res.json({ settings });
});

cardsRouter.get('/builds/:id/card.pdf', requireUser, cardRenderLimiter, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const query = parseQuery(req, CardQuerySchema);
  const build = await loadFullBuildOrThrow(id);
  authorizeBuild(currentUser(req), 'edit', build);
  const settings = settingsFromQuery(savedCardSettings(build), query);
  // The card is drawn from the public face only, so nothing private can reach the paper.
  const publicBuild = presentPublicBuild(build);
  const { pdf, leftOff } = await renderCard(publicBuild, settings, {
    show: showFromQuery(query),
    cover: await loadCoverImage(publicBuild, settings),
    highlight: await cardHighlightWords(build.id, settings.highlight),
  });
  const file = `placard-${build.code}-${settings.design}-${settings.paper}-${settings.orientation}.pdf`;
  res
    .type('application/pdf')
    .set('Content-Disposition', `${query.download === '1' ? 'attachment' : 'inline'}; filename="${file}"`)
    // What did not fit, for the designer to say; a header keeps the PDF one plain GET.
    .set(CARD_LEFT_OFF_HEADER, encodeURIComponent(JSON.stringify(leftOff)))
    .send(pdf);
});

cardsRouter.get('/builds/:id/qr.png', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  res.type('image/png').set('Content-Disposition', `attachment; filename="placard-${build.code}-qr.png"`).send(await qrPng(publicBuildUrl(build.code)));
});

cardsRouter.get('/builds/:id/qr.svg', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  res.type('image/svg+xml').set('Content-Disposition', `attachment; filename="placard-${build.code}-qr.svg"`).send(await qrSvg(publicBuildUrl(build.code)));
});
