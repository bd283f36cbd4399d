import { lightFormat } from '@shared/build-log/light-format';

/** A post's or an answer's light formatting, as the public page shows it (React escapes every piece). */
export function LightText({ text, className = '' }: { text: string; className?: string }) {
  return (
    <div className={`flex flex-col gap-2 ${className}`}>
      {lightFormat(text).map((paragraph, i) => (
        <p key={i}>
          {paragraph.map((line, j) => (
            <span key={j}>
              {j > 0 ? <br /> : null}
              {line.map((piece, k) =>
                piece.kind === 'em' ? (
                  <em key={k}>{piece.text}</em>
                ) : piece.kind === 'link' ? (
                  <a key={k} href={piece.href} rel="nofollow ugc noopener" target="_blank" className="underline underline-offset-4">
                    {piece.text}
                  </a>
                ) : (
                  piece.text
                ),
              )}
            </span>
          ))}
        </p>
      ))}
    </div>
  );
}
