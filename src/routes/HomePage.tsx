import { ChestSketch } from '../components/ChestSketch.tsx';

const capabilities = [
  { title: 'Every part and joint', text: 'Rails, stiles, legs, panels, drawer boxes and doors sized to the millimetre, with every tongue, groove, rabbet and notch — and the router-table set-up to cut them.' },
  { title: 'Wood that moves', text: 'Seasonal movement of each solid part from published shrinkage coefficients and your climate: panel float, slotted fastener holes, glue-up widths.' },
  { title: 'See it before you cut', text: 'A live 3D model — assembled, exploded or cut away — that follows every change, in the tone of the species you chose.' },
  { title: 'Buy the right wood', text: 'Board feet and sheet counts, cutting diagrams that respect kerf and grain, and a costed shopping list from your own price list.' },
  { title: 'Fit the room', text: 'Check the footprint, the lid swinging open under the window sill, the drawers pulled out, and whether it goes through the door.' },
  { title: 'Plans to build from', text: 'A dimensioned plan set: overall and exploded views, a drawing of every part, cut list, glue-up order, finishing schedule and safety notes.' },
];

const steps = [
  ['Describe the piece', 'Overall size, construction, woods and sheet goods — type sizes as 1 3/4", 44.5 mm or 2\' 6".'],
  ['Check it', 'Panel float, tongue fit, shelf sag, lid-support torque, tip-over and child-safety cautions, each with the numbers and the fix.'],
  ['Share it', 'Save revisions, fork a variation, compare, and let your client comment and approve one exact revision.'],
  ['Build it', 'Print the plan set, buy from the shopping list, cut from the diagrams, glue up in stages.'],
];

/** What Casewright is, for a visitor who has not signed in. */
export function HomePage() {
  return (
    <div className="mx-auto max-w-7xl px-4 py-10">
      <section className="grid items-center gap-10 md:grid-cols-[1.1fr_1fr]">
        <div>
          <p className="font-mono text-xs uppercase tracking-[0.2em] text-pencil">Case furniture, worked out</p>
          <h1 className="mt-3 text-4xl font-semibold leading-tight tracking-tight md:text-5xl">
            Design chests, dressers and cabinets that go together the first time.
          </h1>
          <p className="mt-5 max-w-xl text-lg text-graphite-soft">
            Give Casewright the piece you want. It works out every part, joint and clearance, checks that the solid
            wood can move with the seasons, shows the piece in 3D, lays out the boards and sheets to buy, fits it to
            the room, and prints a dimensioned plan set — and keeps every revision for your shop and your client.
          </p>
          <div className="mt-7 flex flex-wrap gap-3">
            <a href="/signin" className="btn btn-primary">Sign in to your workshop</a>
            <a href="#how" className="btn">How it works</a>
          </div>
        </div>
        <figure className="card p-4">
          <ChestSketch />
          <figcaption className="mt-2 border-t border-rule pt-2 font-mono text-xs text-graphite-soft">
            FRONT VIEW · frame-and-panel chest with corner legs · scale 1:8
          </figcaption>
        </figure>
      </section>

      <section aria-labelledby="what" className="mt-16">
        <h2 id="what" className="text-2xl font-semibold">What it does for you</h2>
        <ul className="mt-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {capabilities.map((c) => (
            <li key={c.title} className="card p-5">
              <h3 className="font-semibold">{c.title}</h3>
              <p className="mt-2 text-sm leading-relaxed text-graphite-soft">{c.text}</p>
            </li>
          ))}
        </ul>
      </section>

      <section id="how" aria-labelledby="how-title" className="mt-16">
        <h2 id="how-title" className="text-2xl font-semibold">How it works</h2>
        <ol className="mt-6 grid gap-4 md:grid-cols-4">
          {steps.map(([title, text], i) => (
            <li key={title} className="border-l-2 border-pencil pl-4">
              <span className="font-mono text-sm text-pencil">{String(i + 1).padStart(2, '0')}</span>
              <h3 className="mt-1 font-semibold">{title}</h3>
              <p className="mt-1 text-sm text-graphite-soft">{text}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="safety" className="mt-16 rounded-sm border border-caution bg-caution-soft/60 p-5">
        <h2 id="safety" className="font-semibold text-caution">Safety comes with the drawings</h2>
        <p className="mt-2 text-sm text-graphite">
          A chest lid can trap or crush a child and a dresser can tip over. Casewright shows the usual cautions — lid
          supports that hold in any position, ventilation, anchoring to the wall, safe router, saw and spray-finishing
          practice — and defers to local codes, product standards and licensed practice. It never certifies a piece as safe.
        </p>
      </section>
    </div>
  );
}
