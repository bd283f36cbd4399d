import { Document } from '@react-pdf/renderer';
import type { CardDesign, Orientation, Paper } from '@shared/schemas/card';
import type { CardContent } from './content';
import { PosterCard } from './poster';
import { DataSheetCard } from './data-sheet';
import { CompactCard } from './compact';

const DESIGNS = { poster: PosterCard, 'data-sheet': DataSheetCard, compact: CompactCard } as const;

/** A windshield card: one document, one page, in the chosen design and paper. */
export function CardDocument({ content, design, paper, orientation, title }: { content: CardContent; design: CardDesign; paper: Paper; orientation: Orientation; title: string }) {
  const Card = DESIGNS[design];
  return (
    <Document title={title} author="Placard" creator="Placard" producer="Placard">
      <Card content={content} paper={paper} orientation={orientation} />
    </Document>
  );
}
