import type { CardShow, Orientation, Paper } from '@shared/schemas/card';
import type { SectionKind } from '@shared/schemas/build-sections';

/**
 * Everything a card prints, already in words and in the chosen units: the templates lay it out
 * and decide nothing else. The service (server/services/builds/cards.ts) builds it from the public build.
 */
export type CardContent = {
  /** Year and body, the big line: "1969 fastback coupe". */
  heading: string;
  /** The build's own name when it says more than the heading. */
  name: string | null;
  /** "Restomod · owner Jo Example". */
  byline: string;
  figures: CardFigure[];
  engineLine: string;
  sections: CardSection[];
  credits: Array<{ role: string; name: string }>;
  /** The owner's story, paragraphs split by blank lines: printed last, when there is room. */
  story: string;
  /** The worked-out figures the owner chose to show (brake split, roll centre, camber gain, CG height), in words; the data sheet prints them. */
  engineering?: Array<{ label: string; value: string }>;
  /** Chassis, brake and suspension figures carry it. */
  caution: string | null;
  qr: { size: number; dark: boolean[] };
  /** Printed under the QR code, without the scheme: "placard.example/c/K7P2M9Q". */
  shortUrl: string;
  cover: { data: Buffer; format: 'jpg' | 'png'; width: number; height: number } | null;
  show: CardShow | null;
  /** One answered question or log post the owner chose to print, in words: "ASKED OFTEN" with the question and answer, or a post's date and title with its words. */
  highlight?: CardHighlightWords | null;
};

export type CardHighlightWords = { label: string; heading: string; text: string };

export type CardFigure = { label: string; value: string; unit: string; mark: string; note: string };
export type CardSection = { kind: SectionKind; label: string; summary: string; rows: Array<{ label: string; value: string }>; madeBy: string | null };

export type CardProps = { content: CardContent; paper: Paper; orientation: Orientation };
