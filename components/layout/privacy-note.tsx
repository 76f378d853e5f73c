// The standing cautions: clips are personal data, and the product measures, it does not treat.
export function PrivacyNote() {
  return (
    <p className="text-label text-slate-600">
      Clips show people: they are personal data, private by default and recorded only with the golfer&apos;s consent
      (a guardian&apos;s for a minor). A golfer can download or delete their data at any time. Fitframe measures
      equipment and strokes; it gives no medical advice — pain or injury belongs with a licensed professional.
    </p>
  );
}
