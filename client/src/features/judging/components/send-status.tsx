/** What the server does not have yet, in words; refusals in full, because the judge must act on them. */
export function SendStatus({ unsent, refused }: { unsent: number; refused: string[] }) {
  return (
    <div className="space-y-2" data-testid="send-status">
      {unsent > 0 ? (
        <p role="status" className="border-l-4 border-caution bg-white px-3 py-2 font-semibold">
          {unsent} {unsent === 1 ? 'line' : 'lines'} not yet sent: kept on this phone and sent when there is a signal.
        </p>
      ) : (
        <p role="status" className="border-l-4 border-ok bg-white px-3 py-2">
          Everything is sent.
        </p>
      )}
      {refused.map((m) => (
        <p key={m} role="alert" className="border-l-4 border-danger bg-white px-3 py-2 font-semibold">
          Not recorded: {m}
        </p>
      ))}
    </div>
  );
}
