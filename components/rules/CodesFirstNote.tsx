/** The note every rule page carries: the app's numbers never replace local codes or licensed trades. */
export function CodesFirstNote() {
  return (
    <aside className="rounded-lg border-2 border-amberline-500 bg-amberline-100 p-4 text-sm text-walnut-900">
      <strong>Local codes and licensed practice come first.</strong> These checks help you plan; they are not an inspection. Where your jurisdiction&apos;s
      adopted codes, the equipment maker&apos;s instructions or a licensed electrician or builder ask for more, follow them.
    </aside>
  );
}
