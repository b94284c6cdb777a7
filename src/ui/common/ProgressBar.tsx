/** A labelled progress bar; without a total it shows activity only. */
export function ProgressBar({ label, done, total }: { label: string; done: number; total: number | null }) {
  const fraction = total === null || total <= 0 ? null : Math.min(1, done / total);
  return (
    <div className="progress" role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} {...(fraction === null ? {} : { "aria-valuenow": Math.round(fraction * 100) })}>
      <div className={`progress-fill${fraction === null ? " progress-busy" : ""}`} style={fraction === null ? undefined : { width: `${fraction * 100}%` }} />
      <span className="progress-text">
        {label}
        {fraction !== null && ` ${Math.round(fraction * 100)} %`}
      </span>
    </div>
  );
}
