/**
 * The cautions paragraph of a study whose service touches health, emergency response or safety,
 * worded as the report prints it: estimates, checked against reality, local rules first, the
 * decision with licensed professionals.
 */
export function StudyCautions() {
  return (
    <aside aria-labelledby="study-cautions-title" className="my-8 rounded-md border-l-4 border-warn bg-warn-tint/60 px-5 py-4">
      <h2 id="study-cautions-title" className="font-serif text-base font-bold text-warn">
        Cautions
      </h2>
      <p className="mt-1 font-serif text-sm leading-relaxed text-ink">
        The figures in this study are model estimates under the assumptions it states. Check them against observed
        performance before relying on them. Staffing rules set by law, regulators or collective agreements take
        precedence over anything here, and decisions remain with the client’s responsible, licensed professionals.
      </p>
    </aside>
  );
}
