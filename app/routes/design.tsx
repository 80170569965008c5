import type { Route } from "./+types/design";
import { EmptyState } from "#app/components/ui/empty-state.tsx";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { FlagChip, FlagNotes } from "#app/components/ui/flag.tsx";
import { PageTitle } from "#app/components/ui/page-title.tsx";
import { Qty } from "#app/components/ui/quantity.tsx";
import { TableFrame } from "#app/components/ui/table-frame.tsx";
import { VerdictMark } from "#app/components/ui/verdict.tsx";
import { FLAG_WORDS } from "#app/domain/flag-words.ts";
import { requireUser } from "#app/lib/auth.server.ts";

// The team's page of Betasift's visual language: every component in its states (DEVELOPERS.md says why each is so).
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return null;
}

export const meta: Route.MetaFunction = () => [{ title: "Design language · Betasift" }];

const COLOURS = [
  { name: "ink", className: "bg-ink", meaning: "text and rules of emphasis" },
  { name: "paper", className: "bg-paper", meaning: "the page behind the work" },
  { name: "rule", className: "bg-rule", meaning: "frames and dividers" },
  { name: "signal", className: "bg-signal", meaning: "actions and links, never a verdict" },
  { name: "fit", className: "bg-fit", meaning: "the fits verdict" },
  { name: "caution", className: "bg-caution", meaning: "marginal, and findings that weaken a figure" },
  { name: "fault", className: "bg-fault", meaning: "fails, refusals and errors" },
];

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="mt-10">
      <h2 className="text-lg font-semibold">{title}</h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

export default function Design() {
  return (
    <div>
      <PageTitle title="Design language" lead="How Betasift shows verdicts, findings, values, tables and forms, each in its states." />
      <Section title="Type">
        <p className="text-[1.625rem] font-semibold leading-tight">Page title, 26 px semibold</p>
        <p className="text-lg font-semibold">Section, 18 px semibold</p>
        <p className="text-base">Body, 16 px: the sentences that explain a result.</p>
        <p className="text-sm text-ink/75">Secondary, 14 px: table cells, hints, notes.</p>
        <p className="text-xs text-ink/75">Small, 12 px: flags and marks.</p>
      </Section>
      <Section title="Colours and what they mean">
        <ul className="grid gap-2 sm:grid-cols-2">
          {COLOURS.map((colour) => (
            <li key={colour.name} className="flex items-center gap-3 text-sm">
              <span className={`inline-block h-6 w-10 rounded-sm border border-rule ${colour.className}`} />
              <span className="font-medium">{colour.name}</span>
              <span className="text-ink/75">{colour.meaning}</span>
            </li>
          ))}
        </ul>
        <p className="mt-3 text-sm text-ink/75">No colour stands alone: every verdict carries its word and its number of notches.</p>
      </Section>
      <Section title="Verdicts">
        <div className="flex flex-wrap items-center gap-6">
          <VerdictMark verdict="fits" />
          <VerdictMark verdict="marginal" />
          <VerdictMark verdict="fails" />
          <VerdictMark verdict="fits" size="sm" />
        </div>
      </Section>
      <Section title="Flags">
        <p className="mb-3 text-sm text-ink/75">A filled pennant is a finding against the sheet; a hollow one is about the datasheet data. Click, tap or press Enter for the explanation.</p>
        <div className="flex flex-wrap gap-2">
          {Object.keys(FLAG_WORDS).map((flag) => (
            <FlagChip key={flag} flag={flag} />
          ))}
        </div>
        <div className="mt-4">
          <FlagNotes flags={["no-min-gain", "early-unknown"]} emptyText="No findings." />
        </div>
      </Section>
      <Section title="Values with units">
        <p className="flex flex-wrap gap-6 text-sm">
          <Qty value={0.00025} dimension="current" />
          <Qty value={3300} dimension="resistance" />
          <Qty value={62.5} dimension="thermal-resistance" />
          <Qty value={null} dimension="voltage" />
        </p>
      </Section>
      <Section title="Buttons">
        <div className="flex flex-wrap gap-3">
          <Button>Main action</Button>
          <Button look="secondary">Other action</Button>
          <Button look="danger">Cannot be undone</Button>
          <Button disabled>Busy</Button>
        </div>
      </Section>
      <Section title="Forms">
        <div className="grid max-w-xl gap-4">
          <TextField label="Collector current" name="example-ic" defaultValue="350 mA" hint="Read as 350 mA." />
          <TextField label="Supply" name="example-supply" defaultValue="500" error="Give a unit: 500 V or 500 mV?" />
        </div>
      </Section>
      <Section title="Notices">
        <div className="grid max-w-xl gap-3">
          <Notice tone="info">Saved. The ranking is up to date.</Notice>
          <Notice tone="caution">Above about 50 V: the datasheet and its safe operating area govern.</Notice>
          <Notice tone="fault">Nothing was saved: two fields need a unit.</Notice>
        </div>
      </Section>
      <Section title="Empty state">
        <EmptyState title="No intakes yet" action={<Button look="secondary">Upload a file</Button>}>
          Each uploaded file of datasheet values or offers is listed here.
        </EmptyState>
      </Section>
      <Section title="Tables">
        <TableFrame label="Example table">
          <table className="w-full min-w-[640px] border-collapse text-sm">
            <thead>
              <tr className="border-b border-rule text-left">
                <th className="px-3 py-2 font-medium">Part</th>
                <th className="px-3 py-2 font-medium">Verdict</th>
                <th className="px-3 py-2 text-right font-medium">VCEO</th>
                <th className="px-3 py-2 text-right font-medium">IC max</th>
                <th className="px-3 py-2 font-medium">Findings</th>
              </tr>
            </thead>
            <tbody>
              <tr className="border-b border-rule/60">
                <td className="px-3 py-2 font-medium">TW-G3152</td>
                <td className="px-3 py-2"><VerdictMark verdict="marginal" size="sm" /></td>
                <td className="px-3 py-2 text-right"><Qty value={55} dimension="voltage" /></td>
                <td className="px-3 py-2 text-right"><Qty value={1.8} dimension="current" /></td>
                <td className="px-3 py-2"><FlagChip flag="inside-derating" /></td>
              </tr>
            </tbody>
          </table>
        </TableFrame>
      </Section>
    </div>
  );
}
