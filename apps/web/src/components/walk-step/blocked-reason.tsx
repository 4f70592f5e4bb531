// Why a step's answers cannot be given yet ("This step needs a photo first: …"), beside the
// disabled buttons and named by them (aria-describedby), so nobody taps a grey button wondering.
export function BlockedReason({ id, reason }: { id: string; reason: string }) {
  return (
    <p
      id={id}
      role="status"
      className="flex items-start gap-2 rounded-control border-2 border-caution-line bg-caution-bg px-3 py-2 font-semibold text-caution-ink"
    >
      <span aria-hidden="true">!</span>
      <span>{reason}</span>
    </p>
  );
}
