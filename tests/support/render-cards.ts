// Renders every card design in every paper and orientation into a folder, for looking at them:
//   npx tsx tests/support/render-cards.ts /tmp/cards [--long] [--show] [--photo file.jpg]
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { CARD_DESIGNS, DEFAULT_CARD_SETTINGS, ORIENTATIONS, PAPERS } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { renderCardPdf } from '@server/services/cards';
import { longestPublicBuild, typicalPublicBuild } from './card-fixtures';

const args = process.argv.slice(2);
const out = args.find((a) => !a.startsWith('--')) ?? '/tmp/cards';
const photoArg = args.indexOf('--photo');
const photo = photoArg >= 0 ? readFileSync(args[photoArg + 1]!) : null;
mkdirSync(out, { recursive: true });
const build = args.includes('--long') ? longestPublicBuild() : typicalPublicBuild();
const show = args.includes('--show') ? { showName: 'Riverside Autumn Run', className: 'Restomod, 1960–1975', entryNumber: '117' } : null;
for (const design of CARD_DESIGNS) {
  for (const paper of PAPERS) {
    for (const orientation of ORIENTATIONS) {
      const settings = { ...DEFAULT_CARD_SETTINGS, design, paper, orientation, sections: [...SECTION_KINDS], figures: ['power', 'torque', 'weight', 'powerToWeight'] as const };
      const pdf = await renderCardPdf(build, { ...settings, figures: [...settings.figures] }, { show, cover: photo ? { data: photo, format: 'jpg', width: 1600, height: 1067 } : null });
      const file = path.join(out, `${design}-${paper}-${orientation}.pdf`);
      writeFileSync(file, pdf);
      console.log(file, pdf.length);
    }
  }
}
