// Shown on every page: results are for planning throughput, nothing more.
export function SafetyNote() {
  return (
    <footer className="border-t border-paper-sunk bg-paper-sunk/60 print:hidden">
      <div className="mx-auto flex max-w-6xl flex-col gap-1 px-4 py-5 text-sm text-ink-soft sm:px-6">
        <p>
          <strong className="font-semibold text-caution">Planning aid only.</strong> Lanewright estimates throughput; it
          does not assess safety. Guarding, risk assessment and electrical work for moving carriers, elevators and motor
          power must follow local codes, the machine&apos;s safety standards and the practice of licensed professionals.
        </p>
      </div>
    </footer>
  );
}
