export interface StaffMember { name: string | null; email: string; role: "owner" | "designer" }

const roleLabel = { owner: "Owner", designer: "Designer" } as const;

export function StaffList({ staff }: { staff: StaffMember[] }) {
  return (
    <ul className="divide-y divide-line" data-testid="studio-staff">
      {staff.map((p) => (
        <li key={p.email} className="flex flex-wrap items-baseline justify-between gap-x-3 py-2">
          <span className="min-w-0">
            <span className="font-medium">{p.name || p.email}</span>
            {p.name && <span className="block break-all text-sm text-ink-soft">{p.email}</span>}
          </span>
          <span className="text-sm text-ink-soft">{roleLabel[p.role]}</span>
        </li>
      ))}
    </ul>
  );
}
