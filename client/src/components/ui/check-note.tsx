/**
 * A spec-check note beside a field: what to look at, with the reasoning one tap away. The same
 * reasoning often applies to several fields (every undated measured figure); the numbers panel says
 * it once under all of them, so beside each field it waits to be asked for.
 */
export function CheckNote({ message, why }: { message: string; why: string }) {
  return (
    <div className="border-l-4 border-caution bg-white/70 px-2 py-1 text-sm">
      <p>
        <span className="font-semibold">Check: </span>
        {message}
      </p>
      <details className="text-graphite">
        <summary className="inline-flex min-h-11 cursor-pointer items-center underline underline-offset-2">Why?</summary>
        <p className="pb-1">{why}</p>
      </details>
    </div>
  );
}
