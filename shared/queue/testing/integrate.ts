/** Test helper: composite Simpson integral of f over [0, upper] with an even number of panels. */
export function simpson(f: (x: number) => number, upper: number, panels: number): number {
  const h = upper / panels;
  let s = f(0) + f(upper);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(i * h);
  return (s * h) / 3;
}
