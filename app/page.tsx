import Link from "next/link";
import { RunSketch } from "@/components/landing/RunSketch";

const STEPS = [
  { title: "Measure the room as it is", body: "Type the wall lengths off your tape, fractions and all, and a diagonal or two. Benchwright solves the floor and tells you how far from square the garage really is." },
  { title: "Place cabinets, the saw and the racks", body: "Drawer cabinets, a saw shelf whose height is computed so the saw table lands flush with the counters, a stop track, wall cabinets, shelves and a lumber rack, around the door, the car and the panel." },
  { title: "See the clearances before you cut", body: "Every move re-runs the checks: a clear path for long boards on both sides of the blade, walkways, the panel's working space, drawer pull-out, the door track, the parking bay. Each rule shows its numbers and where they come from." },
  { title: "Take the plan to the saw", body: "Parts with joinery allowances, sheet maps with the blade's kerf, boards, hardware, a shopping list with your prices, and a stop table for repeat cuts, printed or on your phone." },
];

export default function Landing() {
  return (
    <div className="mx-auto max-w-6xl px-4 pb-16">
      <section className="grid items-center gap-8 py-10 md:grid-cols-2 md:py-16">
        <div>
          <p className="mb-3 text-sm font-medium uppercase tracking-wider text-amberline-700">For a shop in part of a garage</p>
          <h1 className="text-3xl font-bold leading-tight tracking-tight text-walnut-900 sm:text-4xl">Plan a woodshop that fits the garage, the car and you.</h1>
          <p className="mt-4 text-lg text-walnut-700">
            Benchwright turns tape-measure numbers into a shop layout you can check and build: modular drawer cabinets, a miter saw flush with the
            counters, room for long boards, and a cut list that knows about kerf.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <Link href="/signup" className="rounded-md bg-walnut-700 px-5 py-2.5 font-medium text-paper hover:bg-walnut-900">Start a plan</Link>
            <Link href="/rules" className="rounded-md border border-walnut-300 px-5 py-2.5 font-medium text-walnut-700 hover:bg-walnut-50">Why the clearance rules exist</Link>
          </div>
        </div>
        <RunSketch />
      </section>
      <section aria-labelledby="how" className="py-6">
        <h2 id="how" className="mb-6 text-2xl font-semibold text-walnut-900">How it works</h2>
        <ol className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {STEPS.map((s, i) => (
            <li key={s.title} className="rounded-lg border border-walnut-100 bg-white/60 p-4">
              <span className="mb-2 inline-flex h-7 w-7 items-center justify-center rounded-full bg-amberline-100 text-sm font-semibold text-amberline-700">{i + 1}</span>
              <h3 className="font-semibold text-walnut-900">{s.title}</h3>
              <p className="mt-1 text-sm text-walnut-700">{s.body}</p>
            </li>
          ))}
        </ol>
      </section>
      <section className="mt-8 grid gap-4 md:grid-cols-3">
        <div className="rounded-lg bg-walnut-700 p-5 text-paper">
          <h3 className="font-semibold">Share it with the friend who helps</h3>
          <p className="mt-1 text-sm text-walnut-100">A read-only link shows the room, the checks and the parts. They can copy it into their own account.</p>
        </div>
        <div className="rounded-lg bg-pine-700 p-5 text-paper">
          <h3 className="font-semibold">Teach the clearances</h3>
          <p className="mt-1 text-sm text-pine-100">Instructors set stricter numbers for a class and step through a plan rule by rule.</p>
        </div>
        <div className="rounded-lg border-2 border-amberline-500 bg-amberline-100 p-5 text-walnut-900">
          <h3 className="font-semibold">Safety comes first</h3>
          <p className="mt-1 text-sm">Benchwright shows the usual cautions for saws, dust, finishes, anchoring and electrical work. Local codes and licensed trades have the final word.</p>
        </div>
      </section>
    </div>
  );
}
