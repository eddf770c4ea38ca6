// Stated on every result: a throughput plan is not a safety assessment.
export function SafetyCaution() {
  return (
    <aside
      aria-label="Safety caution"
      className="rounded-md border-l-4 border-caution bg-caution-soft px-4 py-3 text-sm text-ink"
    >
      <strong className="font-semibold">These results plan throughput only; they are not a safety sign-off.</strong>{' '}
      Moving carriers, elevators, magnets and motor power can injure. Guarding, risk assessment and electrical work
      follow local codes, the machine&apos;s safety standards and licensed practice.
    </aside>
  );
}
