import type { Metadata } from "next";
import { PublicFrame } from "@/components/shell/PublicFrame";
import { Caution, LinkButton, MarginBar, Quantity, type Status } from "@/components/ui";

export const metadata: Metadata = {
  title: { absolute: "Heatsplit · gate-drive loss and thermal budgets" },
};

// Demo figures for the picture on this page only: invented, not computed,
// not taken from any datasheet. They show what a budget looks like.
const EXAMPLE: { stage: string; part: string; loss: number; tj: number; limit: number; tjMax: number; status: Status }[] = [
  { stage: "Controller", part: "PWM IC, own driver pin", loss: 0.21, tj: 92.4, limit: 125, tjMax: 150, status: "ok" },
  { stage: "Driver", part: "NPN/PNP emitter follower", loss: 0.118, tj: 117.9, limit: 125, tjMax: 150, status: "close" },
  { stage: "Switch", part: "MOSFET Q1, 2 in parallel", loss: 2.84, tj: 139.6, limit: 135, tjMax: 150, status: "over" },
];

function Chevron() {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 24" className="hidden h-6 w-3 shrink-0 text-copper-500 sm:block">
      <path d="M2 3l7 9-7 9" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

function ExampleBudget() {
  return (
    <figure className="rounded-panel border border-paper-line bg-paper-raised p-5 shadow-lift">
      <figcaption className="mb-4 flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-sm font-semibold text-ink">Example budget, worst corner</span>
        <span className="font-mono text-xs text-ink-faint">
          Vin max · Ta <Quantity value={55} unit="°C" /> · f<sub>sw</sub> <Quantity value={200e3} unit="Hz" />
        </span>
      </figcaption>
      <ol className="flex flex-col gap-2 sm:flex-row sm:items-stretch">
        {EXAMPLE.map((row, i) => (
          <li key={row.stage} className="flex flex-1 items-center gap-2">
            {i > 0 && <Chevron />}
            <div className="flex-1 rounded-md border border-paper-line bg-paper px-3 py-2.5">
              <p className="text-xs font-semibold tracking-wider text-ink-faint uppercase">{row.stage}</p>
              <p className="truncate text-xs text-ink-soft">{row.part}</p>
              <p className="mt-1 text-lg">
                <Quantity value={row.loss} unit="W" strong />
              </p>
            </div>
          </li>
        ))}
      </ol>
      <div className="mt-5 grid gap-3">
        {EXAMPLE.map((row) => (
          <MarginBar key={row.stage} label={row.stage} tj={row.tj} limit={row.limit} tjMax={row.tjMax} status={row.status} from={55} />
        ))}
      </div>
      <p className="mt-3 text-xs text-ink-faint">Figures invented for illustration.</p>
    </figure>
  );
}

const COMPUTES = [
  {
    head: "Gate-drive power",
    body: "ΔQ × ΔV × fsw from the datasheet gate-charge curve (Qgs, Qgd, Qg, Miller plateau), per MOSFET and per parallel count, negative turn-off bias included.",
  },
  {
    head: "Where that power is burnt",
    body: "Each edge's energy shared over the driver's source and sink resistance, the external gate resistors (with a steering diode, if fitted) and Rg(int) inside the switch.",
  },
  {
    head: "Every way of driving a gate",
    body: "Straight from the controller pin, through a bipolar buffer, a gate-driver IC or a gate-drive transformer, or self-driven from a winding for synchronous rectifiers.",
  },
  {
    head: "Switching and conduction",
    body: "Edge times from the gate current on the plateau, Eoss and Qrr at hard turn-on, Rds(on) rising with junction temperature, body-diode conduction in the dead time.",
  },
  {
    head: "The board's thermal network",
    body: "RθJA, or junction-case-sink-ambient, with neighbouring parts heating each other. Loss and temperature are solved together; thermal runaway is reported as runaway, never as a number.",
  },
  {
    head: "Corners and spread",
    body: "Input voltage min/nom/max, load points and the worst ambient, with the worst corner per part. A seeded Monte Carlo over part spread gives the chance of passing the limit.",
  },
];

const PEOPLE = [
  { who: "Designer", what: "Sees how much heat leaves the controller when the drive current moves to external parts, and what the slower or faster edges do to the switches." },
  { who: "Thermal engineer", what: "Shows that every junction, controller first, stays inside its limit at the worst corner with the company's derating margin." },
  { who: "Engineering manager", what: "Compares the drive options on temperature margin, efficiency, part count and cost, and signs one of them off." },
];

const STEPS = [
  { head: "Parts library", body: "Datasheet values entered once per workspace, each with the document it came from." },
  { head: "Drive options", body: "One project per supply; several ways of driving its gates side by side." },
  { head: "Review", body: "The thermal engineer checks each option against the workspace's derating rule." },
  { head: "Sign-off", body: "The manager chooses one option; the record keeps who decided, when and on what numbers." },
];

export default function LandingPage() {
  return (
    <PublicFrame>
      <section className="mx-auto grid max-w-6xl items-center gap-10 px-4 pt-12 pb-14 sm:px-6 lg:grid-cols-[1fr_1.05fr] lg:pt-16">
        <div>
          <p className="mb-3 font-mono text-xs tracking-widest text-copper-700 uppercase">Gate-drive loss and thermal budget</p>
          <h1 className="text-4xl leading-tight font-semibold tracking-tight text-ink sm:text-5xl">
            Know where every gate charge turns into heat.
          </h1>
          <p className="mt-5 max-w-xl text-lg leading-relaxed text-ink-soft">
            Heatsplit follows the drive power of each MOSFET gate from the controller, through the driver, into the switch.
            It adds switching and conduction loss, solves the board&apos;s thermal network and shows every junction against
            its derated limit, at every corner of input voltage, load and ambient.
          </p>
          <div className="mt-7 flex flex-wrap gap-3">
            <LinkButton href="/sign-up" variant="primary" size="lg">
              Create an account
            </LinkButton>
            <LinkButton href="/sign-in" variant="secondary" size="lg">
              Sign in
            </LinkButton>
          </div>
        </div>
        <ExampleBudget />
      </section>

      <section aria-labelledby="computes" className="border-y border-paper-line bg-paper-raised/60">
        <div className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
          <h2 id="computes" className="text-2xl font-semibold tracking-tight text-ink">What it works out</h2>
          <dl className="mt-6 grid gap-x-8 gap-y-6 sm:grid-cols-2 lg:grid-cols-3">
            {COMPUTES.map((c) => (
              <div key={c.head} className="border-l-2 border-copper-300 pl-4">
                <dt className="font-semibold text-ink">{c.head}</dt>
                <dd className="mt-1 text-sm leading-relaxed text-ink-soft">{c.body}</dd>
              </div>
            ))}
          </dl>
        </div>
      </section>

      <section aria-labelledby="people" className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
        <h2 id="people" className="text-2xl font-semibold tracking-tight text-ink">Three people, one decision</h2>
        <ul className="mt-6 grid gap-4 md:grid-cols-3">
          {PEOPLE.map((p) => (
            <li key={p.who} className="rounded-panel border border-paper-line bg-paper-raised p-5 shadow-panel">
              <p className="font-semibold text-ink">{p.who}</p>
              <p className="mt-1.5 text-sm leading-relaxed text-ink-soft">{p.what}</p>
            </li>
          ))}
        </ul>

        <h2 className="mt-12 text-2xl font-semibold tracking-tight text-ink">From datasheet to sign-off</h2>
        <ol className="mt-6 grid gap-4 md:grid-cols-4">
          {STEPS.map((s, i) => (
            <li key={s.head} className="relative pt-9">
              <span
                aria-hidden="true"
                className="absolute top-0 left-0 grid size-7 place-items-center rounded-full bg-ink font-mono text-xs text-paper"
              >
                {i + 1}
              </span>
              <p className="font-semibold text-ink">{s.head}</p>
              <p className="mt-1 text-sm leading-relaxed text-ink-soft">{s.body}</p>
            </li>
          ))}
        </ol>

        <Caution variant="full" className="mt-12" />
      </section>
    </PublicFrame>
  );
}
