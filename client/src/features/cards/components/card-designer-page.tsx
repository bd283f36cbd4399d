import { useEffect, useRef, useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { CardPreview } from './card-preview';
import {
  CARD_CLASS_NAME_MAX,
  CARD_DESIGNS,
  CARD_DESIGN_LABELS,
  CARD_ENTRY_NUMBER_MAX,
  CARD_FIGURES,
  CARD_FIGURE_LABELS,
  CARD_SHOW_NAME_MAX,
  ORIENTATIONS,
  PAPERS,
  PAPER_SIZES_PT,
  type CardSettings,
  type CardSettingsResponse,
  type CardLeftOff,
  type CardShow,
} from '@shared/schemas/card';
import { SECTION_KINDS, SECTION_LABELS, type SectionKind } from '@shared/schemas/build-sections';
import { PageHeader } from '@client/components/ui/page-header';
import { Panel } from '@client/components/ui/panel';
import { Notice } from '@client/components/ui/notice';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useCardSettings } from '../api/get-card-settings';
import { useSaveCardSettings } from '../api/save-card-settings';
import { cardPdfUrl, qrFileUrl } from '../api/card-files';

const sectionLabel = (k: SectionKind) => (k === 'extra' ? 'Extras' : SECTION_LABELS[k]);

/** The windshield-card designer: pick design, paper, orientation, sections, figures and units; see the PDF; download. */
export function CardDesignerPage() {
  const id = Number(useParams().id);
  const query = useCardSettings(id);
  if (query.isPending) return <LoadingState label="Loading the card…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  return <Designer buildId={id} data={query.data} />;
}

function Designer({ buildId, data }: { buildId: number; data: CardSettingsResponse }) {
  const [settings, setSettings] = useState<CardSettings>(data.settings);
  const [show, setShow] = useState<CardShow>({});
  const [preview, setPreview] = useState(() => cardPdfUrl(buildId, data.settings));
  const [leftOff, setLeftOff] = useState<CardLeftOff[] | null>(null);
  const save = useSaveCardSettings(buildId);
  const changed = useRef(false);

  // The preview follows the choices after a short pause, so a run of clicks renders one PDF.
  useEffect(() => {
    const t = setTimeout(() => setPreview(cardPdfUrl(buildId, settings, show)), 350);
    return () => clearTimeout(t);
  }, [buildId, settings, show]);

  // Choices are saved with the build, so the next show's card is one click.
  const { mutate } = save;
  useEffect(() => {
    if (!changed.current) return;
    const t = setTimeout(() => mutate({ buildId, settings }), 600);
    return () => clearTimeout(t);
  }, [buildId, settings, mutate]);

  const update = (patch: Partial<CardSettings>) => {
    changed.current = true;
    setSettings((s) => ({ ...s, ...patch }));
  };
  const toggle = <T extends string>(list: readonly T[], item: T, order: readonly T[]) =>
    (list.includes(item) ? list.filter((x) => x !== item) : [...list, item]).sort((a, b) => order.indexOf(a) - order.indexOf(b));

  const paper = PAPER_SIZES_PT[settings.paper];
  const ratio = settings.orientation === 'portrait' ? `${paper.width} / ${paper.height}` : `${paper.height} / ${paper.width}`;
  const available = data.build.sections.length ? data.build.sections : [...SECTION_KINDS];

  return (
    <div>
      <PageHeader title="Windshield card">
        <Link to={`/builds/${buildId}`} className="underline underline-offset-4 hover:text-signal-ink">
          {data.build.title}
        </Link>{' '}
        · the QR code opens <span className="font-mono text-sm">{data.build.publicUrl.replace(/^https?:\/\//, '')}</span>
      </PageHeader>
      {!data.build.published ? (
        <div className="mb-4">
          <Notice tone="caution">This build is still a draft: the QR code opens its page only once you publish it.</Notice>
        </div>
      ) : null}

      {/* On a phone the preview comes first and the choices follow; side by side from lg up. */}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,22rem)_1fr]">
        <div className="order-2 space-y-4 lg:order-1">
          <Panel title="Design">
            <Choices legend="Design" hideLegend>
              {CARD_DESIGNS.map((d) => (
                <Radio key={d} name="design" value={d} checked={settings.design === d} onChange={() => update({ design: d })} label={CARD_DESIGN_LABELS[d].name} hint={CARD_DESIGN_LABELS[d].blurb} />
              ))}
            </Choices>
          </Panel>
          <Panel title="Paper">
            <Choices legend="Paper size">
              {PAPERS.map((p) => (
                <Radio key={p} name="paper" value={p} checked={settings.paper === p} onChange={() => update({ paper: p })} label={PAPER_SIZES_PT[p].label} />
              ))}
            </Choices>
            <Choices legend="Orientation" row>
              {ORIENTATIONS.map((o) => (
                <Radio key={o} name="orientation" value={o} checked={settings.orientation === o} onChange={() => update({ orientation: o })} label={o === 'portrait' ? 'Portrait' : 'Landscape'} />
              ))}
            </Choices>
          </Panel>
          <Panel title="What it shows">
            <Choices legend="Sections">
              {available.map((k) => (
                <Check key={k} label={sectionLabel(k)} checked={settings.sections.includes(k)} onChange={() => update({ sections: toggle(settings.sections, k, SECTION_KINDS) })} />
              ))}
            </Choices>
            <Choices legend="Figures">
              {CARD_FIGURES.map((f) => (
                <Check
                  key={f}
                  label={data.build.figures.includes(f) ? CARD_FIGURE_LABELS[f] : `${CARD_FIGURE_LABELS[f]} (not in the build yet)`}
                  checked={settings.figures.includes(f)}
                  onChange={() => update({ figures: toggle(settings.figures, f, CARD_FIGURES) })}
                />
              ))}
            </Choices>
            {data.highlights.length ? (
              <div className="flex flex-col gap-1">
                <label htmlFor="card-highlight" className="text-sm font-semibold">
                  Also print
                </label>
                <select
                  id="card-highlight"
                  className="min-h-11 w-full border border-rule bg-white px-2 text-base"
                  value={settings.highlight ? `${settings.highlight.kind}:${settings.highlight.id}` : ''}
                  onChange={(e) => {
                    const [kind, id] = e.target.value.split(':');
                    update({ highlight: kind ? { kind: kind === 'log' ? 'log' : 'question', id: Number(id) } : null });
                  }}
                >
                  <option value="">Nothing more</option>
                  {data.highlights.map((h) => (
                    <option key={`${h.kind}:${h.id}`} value={`${h.kind}:${h.id}`}>
                      {h.label}
                    </option>
                  ))}
                </select>
                <p className="text-sm text-graphite">One answered question or log post, printed under the sections when there is room.</p>
              </div>
            ) : null}
            <Choices legend="Units" row>
              <Radio name="units" value="imperial" checked={settings.units === 'imperial'} onChange={() => update({ units: 'imperial' })} label="Imperial" />
              <Radio name="units" value="metric" checked={settings.units === 'metric'} onChange={() => update({ units: 'metric' })} label="Metric" />
            </Choices>
          </Panel>
          <Panel title="For a show (optional)">
            <p className="mb-3 text-sm text-graphite">Printed large on the card. Not saved: each show has its own.</p>
            <div className="space-y-3">
              <ShowField label="Show name" value={show.showName ?? ''} max={CARD_SHOW_NAME_MAX} onChange={(v) => setShow((s) => ({ ...s, showName: v }))} />
              <ShowField label="Class" value={show.className ?? ''} max={CARD_CLASS_NAME_MAX} onChange={(v) => setShow((s) => ({ ...s, className: v }))} />
              <ShowField label={`Entry number (1 to ${CARD_ENTRY_NUMBER_MAX})`} value={show.entryNumber ?? ''} max={String(CARD_ENTRY_NUMBER_MAX).length} inputMode="numeric" onChange={(v) => setShow((s) => ({ ...s, entryNumber: v.replace(/\D/g, '') }))} />
            </div>
          </Panel>
        </div>

        <div className="order-1 space-y-3 lg:order-2">
          <div className="flex flex-wrap items-center gap-3">
            <a
              href={cardPdfUrl(buildId, settings, show, { download: true })}
              download
              className="inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display text-base uppercase tracking-wide text-paper hover:border-signal hover:bg-signal"
            >
              Download PDF
            </a>
            <a href={qrFileUrl(buildId, 'png')} download className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
              QR code PNG
            </a>
            <a href={qrFileUrl(buildId, 'svg')} download className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
              QR code SVG
            </a>
            <span role="status" aria-live="polite" className="text-sm text-graphite">
              {save.isPending ? 'Saving your choices…' : save.isError ? 'Your choices could not be saved; try again.' : save.isSuccess ? 'Choices saved with the build.' : data.saved ? 'Your saved choices.' : ''}
            </span>
          </div>
          <div className="mx-auto max-w-md lg:max-w-none">
            <CardPreview url={preview} ratio={ratio} onLeftOff={setLeftOff} />
          </div>
          <LeftOffNotice leftOff={leftOff} />
          <p className="text-sm text-graphite">
            Preview of the PDF as it prints: {PAPER_SIZES_PT[settings.paper].label}, {settings.orientation}. Print at 100% (actual size).
          </p>
        </div>
      </div>
    </div>
  );
}

/** What the card could not print whole, as the last render reported it; the phone page has all of it. */
function LeftOffNotice({ leftOff }: { leftOff: CardLeftOff[] | null }) {
  if (!leftOff) return null;
  if (!leftOff.length) return <p className="text-sm text-graphite">Everything you ticked fits on this card.</p>;
  return (
    <div role="status" aria-label="Left off the card">
      <Notice tone="caution">
        <p className="font-medium">Not everything fits on this paper; the card prints "More on the phone" with its short address.</p>
        <ul className="mt-1 list-disc pl-5">
          {leftOff.map((l, i) => (
            <li key={i}>
              {l.block}: {l.detail}
            </li>
          ))}
        </ul>
      </Notice>
    </div>
  );
}

function Choices({ legend, children, row = false, hideLegend = false }: { legend: string; children: ReactNode; row?: boolean; hideLegend?: boolean }) {
  return (
    <fieldset className="mb-3 last:mb-0">
      <legend className={hideLegend ? 'sr-only' : 'mb-1 font-display text-sm uppercase tracking-wide text-graphite'}>{legend}</legend>
      <div className={row ? 'flex flex-wrap gap-x-4' : 'space-y-1'}>{children}</div>
    </fieldset>
  );
}

function Radio({ name, value, checked, onChange, label, hint }: { name: string; value: string; checked: boolean; onChange: () => void; label: string; hint?: string }) {
  return (
    <label className="flex min-h-11 cursor-pointer items-start gap-3 py-1">
      <input type="radio" name={name} value={value} checked={checked} onChange={onChange} className="mt-1 h-5 w-5 accent-signal" />
      <span>
        <span className="font-medium">{label}</span>
        {hint ? <span className="block text-sm text-graphite">{hint}</span> : null}
      </span>
    </label>
  );
}

function Check({ label, checked, onChange }: { label: string; checked: boolean; onChange: () => void }) {
  return (
    <label className="flex min-h-11 cursor-pointer items-center gap-3">
      <input type="checkbox" checked={checked} onChange={onChange} className="h-5 w-5 accent-signal" />
      <span>{label}</span>
    </label>
  );
}

function ShowField({ label, value, max, onChange, inputMode }: { label: string; value: string; max: number; onChange: (v: string) => void; inputMode?: 'numeric' }) {
  return (
    <label className="block">
      <span className="mb-1 block text-sm font-medium">{label}</span>
      <input value={value} maxLength={max} inputMode={inputMode} onChange={(e) => onChange(e.target.value)} className="min-h-11 w-full border border-rule bg-white px-3" />
    </label>
  );
}
