// The cautions every report carries (PRODUCT.md "Cautions the product shows"; SCIENCE.md §1.2, §1.6).
export function Cautions() {
  return (
    <section
      aria-labelledby="cautions-heading"
      className="report-keep rounded border border-warn-200 bg-warn-50 p-3 text-warn-800"
    >
      <h2 id="cautions-heading" className="text-base text-warn-800">
        Cautions
      </h2>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        <li>Results are research data, not a release test of any product.</li>
        <li>
          The fitted pKa values are apparent, macroscopic constants of the active form: kinetics cannot say
          which group carries which pKa.
        </li>
        <li>
          A rate measured at one substrate concentration mixes the pH dependence of kcat and of kcat/KM unless
          the substrate is far above or far below KM at every pH.
        </li>
      </ul>
    </section>
  );
}
