export const CAUTIONS = [
  "Every figure here is an estimate from a model and the maker's list data. Verify the chosen part against the maker's datasheet and measure it on the bench in the real circuit.",
  "Saturation, temperature rise and core loss depend on layout, airflow, neighbouring parts and waveform details the model does not see.",
  "Power converters store energy and can burn, shock or fail violently. For mains-connected or high-energy designs follow local codes and licensed engineering practice.",
];

export function Cautions({ onClose }: { onClose: () => void }) {
  return (
    <aside className="cautions" role="note" aria-labelledby="cautions-title">
      <h2 id="cautions-title">Before you rely on these numbers</h2>
      <ul>
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      {/* Focus lands here so that the note is read first and closed from the keyboard. */}
      <button type="button" onClick={onClose} autoFocus>
        Understood
      </button>
    </aside>
  );
}
