/** Every saved sizing is a preliminary figure; this says so wherever one is shown in full. */
export function PreliminaryNote() {
  return (
    <p
      role="note"
      className="rounded-md border border-severity-caution/40 bg-paper-raised px-3 py-2 text-sm text-severity-caution"
    >
      Preliminary sizing on an ideal-gas basis. Confirm the design with a qualified engineer under the local
      pressure-equipment and electrical codes before ordering or installing equipment.
    </p>
  );
}
