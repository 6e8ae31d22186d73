/**
 * A studio's cold-working settings: its machines, its abrasive sets and the stock it usually leaves
 * on each worked surface. Stored by the studio and edited by its owner.
 */
import { z } from "zod";

export const coldWorkedSurfaces = ["footBase", "footTop", "bowlFlat", "rim"] as const;
export type ColdWorkedSurface = (typeof coldWorkedSurfaces)[number];

export const coldWorkedSurfaceLabel: Record<ColdWorkedSurface, string> = {
  footBase: "Foot base",
  footTop: "Foot top",
  bowlFlat: "Bowl flat",
  rim: "Rim",
};

const text = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(max, `${label} must be at most ${max} characters.`);

export const machineSchema = z.object({
  id: text("Machine id", 64),
  name: text("Machine name", 120),
  /** downfeed of the grinding head for one full turn of the handwheel, mm */
  downfeedPerTurnMm: z
    .number({ error: "Downfeed per turn must be a number." })
    .positive("Downfeed per turn must be more than 0.")
    .max(25, "Downfeed per turn must be at most 25 mm (about 1 in)."),
});

export const abrasiveStageSchema = z.object({
  kind: z.enum(["grind", "polish"], { error: "Stage kind must be grind or polish." }),
  /** grit number on the named scale; a larger number is finer on both FEPA F and mesh scales */
  grit: z
    .number({ error: "Grit must be a number." })
    .int("Grit must be a whole number.")
    .positive("Grit must be more than 0.")
    .max(100000, "Grit must be at most 100000."),
  /** e.g. "FEPA F" (bonded and loose grains) or "mesh" */
  gritScale: text("Grit scale", 40),
  /** optional description of the abrasive, e.g. "silicon carbide, loose" */
  abrasive: z.string().trim().max(120, "Abrasive must be at most 120 characters.").optional(),
});

export const abrasiveSetSchema = z
  .object({
    id: text("Abrasive set id", 64),
    name: text("Abrasive set name", 120),
    stages: z
      .array(abrasiveStageSchema, { error: "Stages must be a list." })
      .min(1, "An abrasive set needs at least one stage.")
      .max(12, "An abrasive set has at most 12 stages."),
  })
  .superRefine((set, ctx) => {
    // Grinding comes before polishing, and each stage on the same scale is finer than the one before.
    let polishing = false;
    set.stages.forEach((s, i) => {
      if (s.kind === "polish") polishing = true;
      else if (polishing)
        ctx.addIssue({ code: "custom", path: ["stages", i, "kind"], message: "Grinding stages must come before polishing stages." });
      const prev = set.stages
        .slice(0, i)
        .reverse()
        .find((q) => q.gritScale === s.gritScale);
      if (prev && s.grit <= prev.grit)
        ctx.addIssue({
          code: "custom",
          path: ["stages", i, "grit"],
          message: `Grit must be finer (a larger number) than the earlier ${s.gritScale} ${prev.grit} stage.`,
        });
    });
  });

const stock = (label: string) =>
  z
    .number({ error: `${label} stock must be a number.` })
    .min(0, `${label} stock must be 0 or more.`)
    .max(50, `${label} stock must be at most 50 mm.`);

export const studioSettingsSchema = z
  .object({
    machines: z.array(machineSchema, { error: "Machines must be a list." }).min(1, "Add at least one machine."),
    abrasiveSets: z
      .array(abrasiveSetSchema, { error: "Abrasive sets must be a list." })
      .min(1, "Add at least one abrasive set."),
    /** stock usually removed from each worked surface, mm */
    defaultStockMm: z.object(
      {
        footBase: stock("Foot base"),
        footTop: stock("Foot top"),
        bowlFlat: stock("Bowl flat"),
        rim: stock("Rim"),
      },
      { error: "Default stock must give a value for each surface." },
    ),
  })
  .superRefine((s, ctx) => {
    const dup = (list: { id: string }[], path: "machines" | "abrasiveSets", what: string) => {
      const seen = new Set<string>();
      list.forEach((m, i) => {
        if (seen.has(m.id)) ctx.addIssue({ code: "custom", path: [path, i, "id"], message: `Two ${what} share the id "${m.id}".` });
        seen.add(m.id);
      });
    };
    dup(s.machines, "machines", "machines");
    dup(s.abrasiveSets, "abrasiveSets", "abrasive sets");
  });

export type Machine = z.infer<typeof machineSchema>;
export type AbrasiveStage = z.infer<typeof abrasiveStageSchema>;
export type AbrasiveSet = z.infer<typeof abrasiveSetSchema>;
export type StudioSettings = z.infer<typeof studioSettingsSchema>;

/**
 * Invented settings for the demo studio. The 1.524 mm (0.060 in) downfeed per handwheel turn is a
 * common setting; three grinding and three polishing stages, coarse to fine, is common practice.
 */
export const demoStudioSettings: StudioSettings = {
  machines: [
    { id: "flatbed", name: "Wet flatbed grinder", downfeedPerTurnMm: 1.524 },
    { id: "bench-lap", name: "Bench lap, fine feed", downfeedPerTurnMm: 0.5 },
  ],
  abrasiveSets: [
    {
      id: "sic-diamond",
      name: "Silicon carbide, then diamond pads",
      stages: [
        { kind: "grind", grit: 80, gritScale: "FEPA F", abrasive: "silicon carbide, loose" },
        { kind: "grind", grit: 220, gritScale: "FEPA F", abrasive: "silicon carbide, loose" },
        { kind: "grind", grit: 400, gritScale: "FEPA F", abrasive: "silicon carbide, loose" },
        { kind: "polish", grit: 600, gritScale: "mesh", abrasive: "diamond resin pad" },
        { kind: "polish", grit: 1500, gritScale: "mesh", abrasive: "diamond resin pad" },
        { kind: "polish", grit: 3000, gritScale: "mesh", abrasive: "diamond resin pad" },
      ],
    },
    {
      id: "diamond-wheels",
      name: "Diamond wheels throughout",
      stages: [
        { kind: "grind", grit: 60, gritScale: "mesh", abrasive: "diamond wheel" },
        { kind: "grind", grit: 120, gritScale: "mesh", abrasive: "diamond wheel" },
        { kind: "grind", grit: 220, gritScale: "mesh", abrasive: "diamond wheel" },
        { kind: "polish", grit: 400, gritScale: "mesh", abrasive: "resin-bonded diamond" },
        { kind: "polish", grit: 800, gritScale: "mesh", abrasive: "resin-bonded diamond" },
        { kind: "polish", grit: 1500, gritScale: "mesh", abrasive: "resin-bonded diamond" },
      ],
    },
  ],
  defaultStockMm: { footBase: 3, footTop: 3, bowlFlat: 2, rim: 3 },
};
