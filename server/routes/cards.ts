import { Router, type Response } from 'express';
import { IdParamSchema } from '@shared/schemas/params';
import { replaceBody } from '@shared/schemas/body';
import { CardQuerySchema, CardSettingsSchema, type CardQuery, type CardSettings, type CardSettingsResponse } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { validate } from '../middlewares/validate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild, loadFullBuildOrThrow } from '../services/builds';
import { loadCoverImage, qrPng, qrSvg, renderCardPdf, savedCardSettings, settingsFromQuery, showFromQuery } from '../services/cards';
import { publicBuildUrl } from '../presenters/build';
import { presentPublicBuild } from '../presenters/public-build';
import { User } from '../models/user';

/** The owner's windshield cards and QR codes (mounted under /api, after session and CSRF). */
export const cardsRouter = Router();

const CardSettingsReplaceSchema = replaceBody(CardSettingsSchema);
const idOf = (res: Response) => (res.locals.params as { id: number }).id;

cardsRouter.get('/builds/:id/card-settings', requireUser, validate('params', IdParamSchema), async (req, res) => {
  const build = await loadFullBuildOrThrow(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  const body: CardSettingsResponse = {
    settings: savedCardSettings(build),
    saved: build.cardSettings != null,
    build: {
      id: build.id,
      code: build.code,
      title: build.title,
      published: build.published,
      publicUrl: publicBuildUrl(build.code),
      sections: SECTION_KINDS.filter((kind) => build.sections?.some((s) => s.kind === kind)),
    },
  };
  res.json(body);
});

cardsRouter.put('/builds/:id/card-settings', requireUser, validate('params', IdParamSchema), validate('body', CardSettingsReplaceSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  const settings = res.locals.body as CardSettings;
  await build.update({ cardSettings: settings });
  res.json({ settings });
});

cardsRouter.get('/builds/:id/card.pdf', requireUser, cardRenderLimiter, validate('params', IdParamSchema), validate('query', CardQuerySchema), async (req, res) => {
  const build = await loadFullBuildOrThrow(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  const query = res.locals.query as CardQuery;
  const settings = settingsFromQuery(savedCardSettings(build), query);
  // The card is drawn from the public face only, so nothing private can reach the paper.
  const owner = await User.findByPk(build.ownerId, { attributes: ['id', 'name'] });
  const publicBuild = presentPublicBuild(build, { name: owner?.name ?? '' });
  const pdf = await renderCardPdf(publicBuild, settings, { show: showFromQuery(query), cover: await loadCoverImage(publicBuild, settings) });
  const file = `placard-${build.code}-${settings.design}-${settings.paper}-${settings.orientation}.pdf`;
  res
    .type('application/pdf')
    .set('Content-Disposition', `${query.download === '1' ? 'attachment' : 'inline'}; filename="${file}"`)
    .send(pdf);
});

cardsRouter.get('/builds/:id/qr.png', requireUser, validate('params', IdParamSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  res.type('image/png').set('Content-Disposition', `attachment; filename="placard-${build.code}-qr.png"`).send(await qrPng(publicBuildUrl(build.code)));
});

cardsRouter.get('/builds/:id/qr.svg', requireUser, validate('params', IdParamSchema), async (req, res) => {
  const build = await findBuild(idOf(res));
  authorizeBuild(currentUser(req), 'edit', build);
  res.type('image/svg+xml').set('Content-Disposition', `attachment; filename="placard-${build.code}-qr.svg"`).send(await qrSvg(publicBuildUrl(build.code)));
});
