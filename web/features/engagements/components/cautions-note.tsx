/**
 * Shown on engagements whose services touch health, emergency response or safety. The words
 * follow the product's cautions: estimates, checked against reality, local rules first,
 * decisions with licensed professionals.
 */
export function CautionsNote() {
  return (
    <aside aria-labelledby="cautions-title" className="rounded-lg border border-warn/30 border-l-4 border-l-warn bg-warn-tint/60 px-5 py-4">
      <h2 id="cautions-title" className="font-sans text-sm font-semibold text-warn">
        Safety-related engagement
      </h2>
      <p className="mt-1 font-serif text-sm leading-relaxed text-ink">
        Studies here carry the cautions on every page: results are model estimates under stated assumptions and must be
        checked against observed performance. Staffing rules set by law, regulators or collective agreements take
        precedence, and the decision belongs to the client's responsible, licensed professionals.
      </p>
    </aside>
  );
}
