import type { ReactNode } from "react";
import {
  fontFields,
  formatCapacity,
  formatMass,
  type FontFieldErrors,
  type FontFigures as Figures,
  type LengthUnit,
} from "@/models/font";
import { FontFigures } from "../FontFigures";
import { FontFieldInput } from "./FontFieldInput";
import { editField, type DraftState } from "./draft";

const groups: { key: (typeof fontFields)[number]["group"]; title: string }[] = [
  { key: "bowl", title: "Bowl" },
  { key: "foot", title: "Foot" },
  { key: "pedestal", title: "Pedestal" },
  { key: "water", title: "Water" },
  { key: "glass", title: "Glass" },
  { key: "engravings", title: "Engravings" },
];

export function StatusLine({
  errorCount,
  figures,
  unit,
}: {
  errorCount: number;
  figures: Figures | null;
  unit: LengthUnit;
}) {
  return (
    <p className="text-sm" role="status" data-testid="font-status">
      {errorCount > 0 ? (
        <span className="font-medium text-danger">
          {errorCount === 1 ? "One value needs" : `${errorCount} values need`} attention. The picture and figures show
          the last form that worked.
        </span>
      ) : figures ? (
        <span className="text-ink-soft">
          Holds {formatCapacity(figures.capacityLitres, unit)}; weighs {formatMass(figures.filledMassKg, unit)} when
          full.
        </span>
      ) : null}
    </p>
  );
}

interface FieldGroupsProps {
  idPrefix: string;
  draft: DraftState;
  errors: FontFieldErrors;
  readOnly: boolean;
  update: (change: (d: DraftState) => DraftState) => void;
}

export function FieldGroups({ idPrefix, draft, errors, readOnly, update }: FieldGroupsProps) {
  return groups.map((g) => (
    <fieldset key={g.key} className="mb-4 rounded-lg border border-line bg-card px-4 pt-3">
      <legend className="px-1 font-serif text-lg font-semibold">{g.title}</legend>
      {fontFields
        .filter((f) => f.group === g.key)
        .map((f) => (
          <FontFieldInput
            key={f.name}
            field={f}
            idPrefix={idPrefix}
            value={draft.text[f.name]}
            unit={draft.unit}
            errors={errors[f.name]}
            readOnly={readOnly}
            onChange={(v) => update((d) => editField(d, f.name, v))}
          />
        ))}
    </fieldset>
  ));
}

export function FiguresSection({
  idPrefix,
  figures,
  unit,
  stale,
}: {
  idPrefix: string;
  figures: Figures;
  unit: LengthUnit;
  stale: boolean;
}) {
  return (
    <section aria-labelledby={`${idPrefix}-figures`}>
      <h2 id={`${idPrefix}-figures`} className="mb-3 font-serif text-xl font-semibold">
        Figures
      </h2>
      <FontFigures figures={figures} units={unit} stale={stale} />
    </section>
  );
}

interface ParametersFormProps extends FieldGroupsProps {
  formErrors: string[];
  children: ReactNode;
}

/** The entry form: what comes first (the unit choice, a hidden input), the field groups, whole-form errors. */
export function ParametersForm({ formErrors, children, ...fields }: ParametersFormProps) {
  return (
    <form
      className="min-w-0 lg:col-start-1 lg:row-span-2 lg:row-start-1"
      onSubmit={(e) => e.preventDefault()}
      noValidate
      aria-label="Font parameters"
    >
      {children}
      <FieldGroups {...fields} />
      {formErrors.length > 0 && <p className="text-sm font-medium text-danger">{formErrors.join(" ")}</p>}
    </form>
  );
}
