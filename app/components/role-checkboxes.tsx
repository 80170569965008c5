import { ROLE_LABELS, ROLES } from "#app/lib/roles.ts";

const ROLE_HINTS = {
  admin: "everything, plus people and roles",
  librarian: "imports and corrects catalogue data and offers",
  engineer: "writes requirement sheets, ranks parts, builds shortlists",
  purchaser: "prices shortlists, places and pays orders",
} as const;

export function RoleCheckboxes({ selected, error }: { selected: readonly string[]; error?: string }) {
  return (
    <fieldset aria-describedby={error ? "roles-error" : undefined}>
      <legend className="text-sm font-medium">Roles</legend>
      <div className="mt-1 space-y-1">
        {ROLES.map((role) => (
          <label key={role} className="flex items-baseline gap-2 text-sm">
            <input type="checkbox" name="roles" value={role} defaultChecked={selected.includes(role)} />
            <span className="font-medium">{ROLE_LABELS[role]}</span>
            <span className="text-ink/60">{ROLE_HINTS[role]}</span>
          </label>
        ))}
      </div>
      {error ? (
        <p id="roles-error" className="mt-1 text-sm text-fault">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
