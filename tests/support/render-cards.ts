// Renders every card design in every paper and orientation into a folder, for looking at them:
//   npx tsx tests/support/render-cards.ts /tmp/cards [--long|--sparse] [--show] [--photo file.jpg] [--only poster] [--png]
// With --png each PDF is also drawn to a PNG at 60 dpi (poppler's pdftoppm); what was left off is printed.
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { CARD_DESIGNS, DEFAULT_CARD_SETTINGS, ORIENTATIONS, PAPERS } from '@shared/schemas/card';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { renderCard } from '@server/services/builds/cards';
import { ENTRY_SHOWS, longestPublicBuild, sparsePublicBuild, typicalPublicBuild } from './card-fixtures';

const args = process.argv.slice(2);
const out = args.find((a, i) => !a.startsWith('--') && !['--photo', '--only'].includes(args[i - 1] ?? '')) ?? '/tmp/cards';
const valueOf = (flag: string) => (args.indexOf(flag) >= 0 ? args[args.indexOf(flag) + 1] : undefined);
const photoFile = valueOf('--photo');
const photo = photoFile ? readFileSync(photoFile) : null;
mkdirSync(out, { recursive: true });
const build = args.includes('--long') ? longestPublicBuild() : args.includes('--sparse') ? sparsePublicBuild() : typicalPublicBuild();
const show = args.includes('--show') ? ENTRY_SHOWS[2]! : null;
for (const design of CARD_DESIGNS.filter((d) => !valueOf('--only') || d === valueOf('--only'))) {
  for (const paper of PAPERS) {
    for (const orientation of ORIENTATIONS) {
      const settings = { ...DEFAULT_CARD_SETTINGS, design, paper, orientation, sections: [...SECTION_KINDS] };
      const { pdf, leftOff } = await renderCard(build, settings, { show, cover: photo ? { data: photo, format: 'jpg', width: 1600, height: 1067 } : null });
      const file = path.join(out, `${design}-${paper}-${orientation}.pdf`);
      writeFileSync(file, pdf);
      if (args.includes('--png')) execFileSync('pdftoppm', ['-r', '60', '-png', '-singlefile', file, file.replace(/\.pdf$/, '')]);
      console.log(path.basename(file), `${Math.round(pdf.length / 1024)} KB`, leftOff.map((l) => `${l.block}: ${l.detail}`).join(' | '));
    }
  }
}
