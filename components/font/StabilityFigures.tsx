import {
  formatNumber,
  KG_PER_POUND,
  LEANING_DESIGN_LOAD,
  STANDARD_GRAVITY,
  type FontFigures as Figures,
} from "@/models/font";
import { Group, Row } from "./FigureRows";

/** A force in kilograms-force, with newtons and pounds-force beside it. */
export function formatKgf(kgf: number): string {
  return `${formatNumber(kgf, 0)} kgf (${formatNumber(kgf * STANDARD_GRAVITY, 0)} N, ${formatNumber(kgf / KG_PER_POUND, 0)} lbf)`;
}

const shown = (v: number | null, fixed: boolean, fixedWords: string) =>
  v !== null ? formatKgf(v) : fixed ? fixedWords : "Cannot tip: the rim lies within the base";

/** The loads on the rim that would tip the glass off its pedestal and the whole font, and what must be fixed. */
export function StabilityFigures({ figures: f }: { figures: Figures }) {
  const v = f.rimLoadToTipKg;
  const h = f.rimPushToTipKg;
  const x = f.fixing;
  const glassWords = "Fixed to the pedestal";
  const wholeWords = "Fixed to the floor";
  return (
    <div className="grid gap-4 md:grid-cols-2" data-testid="font-stability">
      <Group title="Leaning on the rim: glass off the pedestal">
        <Row testId="lean-glass-full" label="Downward lean on the rim edge, full" value={shown(v.glassOffPedestalFull, x.glassFixed, glassWords)} basis="W·b/(r − b) about the foot's base edge, water at the working level" />
        <Row testId="lean-glass-empty" label="Downward lean on the rim edge, empty" value={shown(v.glassOffPedestalEmpty, x.glassFixed, glassWords)} basis="The same, with no water" />
        <Row label="Sideways push at the rim, empty" value={shown(h.glassOffPedestalEmpty, x.glassFixed, glassWords)} basis="W·b/h, h the rim's height above the foot's base" />
      </Group>
      <Group title="Leaning on the rim: the whole font">
        <Row testId="lean-whole-full" label="Downward lean on the rim edge, full" value={shown(v.wholeFontFull, x.pedestalFixed, wholeWords)} basis="About the pedestal's base edge (half the side when square)" />
        <Row testId="lean-whole-empty" label="Downward lean on the rim edge, empty" value={shown(v.wholeFontEmpty, x.pedestalFixed, wholeWords)} basis="The same, with no water" />
        <Row testId="push-whole-empty" label="Sideways push at the rim, empty" value={shown(h.wholeFontEmpty, x.pedestalFixed, wholeWords)} basis="W·b/h, h the rim's height above the floor" />
      </Group>
      <aside
        className={`rounded-lg border p-4 text-sm md:col-span-2 ${x.glassMustBeFixed || x.pedestalMustBeFixed ? "border-danger bg-card" : "border-line bg-card"}`}
        aria-label="Whether the font must be fixed"
        data-testid="fixing-advice"
      >
        <ul className="list-disc space-y-1 pl-5">
          {x.lines.map((line) => (
            <li key={line} className={/must be fixed/.test(line) ? "font-semibold text-danger" : undefined}>{line}</li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-ink-soft">
          Compared with a downward lean of {formatKgf(LEANING_DESIGN_LOAD.verticalKgf)}: {LEANING_DESIGN_LOAD.verticalSource}; and a
          sideways push of {formatKgf(LEANING_DESIGN_LOAD.horizontalKgf)}: {LEANING_DESIGN_LOAD.horizontalSource}.
        </p>
      </aside>
    </div>
  );
}
