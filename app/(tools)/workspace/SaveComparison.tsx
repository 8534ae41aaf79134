"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { ApiError, api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { inputFieldLabel } from "@/lib/comparisons/fields";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { ComparisonInput } from "@/lib/comparisons/schema";
import { encodeComparison } from "@/lib/comparisons/url";
import type { SavedComparison } from "@/lib/comparisons/api";
import { comparisonNameSchema } from "@/lib/comparisons/savedSchema";
import { type OpenedComparison, useCurrentInput } from "./currentInput";
import { useLeaveGuard } from "@/components/feedback/useLeaveGuard";

const nameForm = z.object({ name: comparisonNameSchema });
type NameForm = z.infer<typeof nameForm>;

/** A name to start from: "265/70R17 → 37x12.50R17LT". */
function suggestedName(input: ComparisonInput): string {
  const tire = (t: string) => t.trim().split(/\s+/)[0] ?? t;
  return `${tire(input.current.tire)} → ${tire(input.planned.tire)}`.slice(0, 120);
}

/** The server's refusal of the input, naming the fields as the workspace labels them (never an input path). */
function inputErrorText(error: unknown, prefs: DisplayPrefs): string | null {
  if (!(error instanceof ApiError)) return null;
  const paths = Object.keys(error.body.fieldErrors ?? {}).filter((k) => k === "input" || k.startsWith("input."));
  if (paths.length === 0) return null;
  const labels = [
    ...new Set(
      paths.map((k) => inputFieldLabel(k.replace(/^input\.?/, ""), prefs, { withSide: true })).filter((l): l is string => l !== null),
    ),
  ];
  return labels.length
    ? `The server did not accept the comparison: check ${labels.join(", ")}.`
    : "The server did not accept the comparison. Check the fields above.";
}

/**
 * The members' save control: save as new, or save changes to the saved comparison they opened.
 * Loaded by SaveSlot only for members (it carries the form library and zod).
 */
export function SaveComparison({ saved: openedFrom }: { saved: OpenedComparison | null }) {
  const { input, complete, vehicleId, onSaved } = useCurrentInput();
  const [prefs] = useDisplayPrefs();
  // Members with a garage tie the comparison to the picked vehicle (or untie it); others send nothing.
  const vehicleBody = vehicleId === undefined ? {} : { vehicleId };
  const qc = useQueryClient();
  const [saved, setSaved] = useState(openedFrom);
  const [formOpen, setFormOpen] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<NameForm>({ resolver: zodResolver(nameForm), defaultValues: { name: "" } });
  // Unsaved: a field is half-typed, or the comparison (or, with a garage, its vehicle) is not
  // what was last saved. Compared through the URL form, which is what the saved link reproduces.
  const dirty =
    saved !== null &&
    (!complete || encodeComparison(input) !== encodeComparison(saved.input) || (vehicleId !== undefined && vehicleId !== saved.vehicleId));
  useLeaveGuard(dirty, saved ? `You have unsaved changes to “${saved.name}”. Leave without saving them?` : "");

  const create = useMutation({
    mutationFn: (name: string) =>
      api<{ comparison: SavedComparison }>("/api/comparisons", { method: "POST", body: { name, input, ...vehicleBody } }),
    onSuccess: ({ comparison }) => {
      setSaved({ id: comparison.id, name: comparison.name, vehicleId: comparison.vehicleId, input: comparison.input });
      // A reload keeps the saved comparison: the workspace names it in its link from now on.
      onSaved(comparison.id);
      setFormOpen(false);
      setNotice(`Saved as “${comparison.name}”.`);
      void qc.invalidateQueries({ queryKey: queryKeys.comparisons.all });
    },
    onError: (error) => {
      const rest = applyFieldErrors(error, form.setError, ["name"]);
      setNotice(inputErrorText(error, prefs) ?? rest);
    },
  });
  const update = useMutation({
    mutationFn: (id: string) =>
      api<{ comparison: SavedComparison }>(`/api/comparisons/${id}`, { method: "PATCH", body: { input, ...vehicleBody } }),
    onSuccess: ({ comparison }) => {
      setSaved({ id: comparison.id, name: comparison.name, vehicleId: comparison.vehicleId, input: comparison.input });
      setNotice(`Changes saved to “${comparison.name}”.`);
      void qc.invalidateQueries({ queryKey: queryKeys.comparisons.all });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.status === 404) {
        setSaved(null);
        setNotice("That saved comparison no longer exists. Save this one as new.");
      } else setNotice(inputErrorText(error, prefs) ?? (error as Error).message);
    },
  });

  const openForm = () => {
    form.reset({ name: saved ? `${saved.name} (variant)`.slice(0, 120) : suggestedName(input) });
    setNotice(null);
    setFormOpen(true);
  };

  return (
    <div className="flex flex-col gap-3 rounded-lg bg-white px-4 py-3 ring-1 ring-basalt-100" data-testid="save-control">
      <div className="flex flex-wrap items-center gap-2">
        {saved ? (
          <>
            <p className="mr-2 text-sm text-basalt-700">
              Saved comparison: <strong className="font-semibold text-basalt-950">{saved.name}</strong>
            </p>
            <span data-testid="save-state">
              {dirty ? <Badge tone="tight">Unsaved changes</Badge> : <Badge tone="clear">All changes saved</Badge>}
            </span>
            <Button onClick={() => update.mutate(saved.id)} pending={update.isPending} disabled={!complete}>
              Save changes
            </Button>
            <Button variant="secondary" onClick={openForm} disabled={!complete || formOpen}>
              Save as new…
            </Button>
          </>
        ) : (
          <Button onClick={openForm} disabled={!complete || formOpen}>
            Save comparison…
          </Button>
        )}
        {saved?.vehicleId && saved.vehicleId === vehicleId && (
          <Link
            href={`/garage/${saved.vehicleId}/checklist?comparison=${saved.id}`}
            className="text-sm font-semibold text-ember-700 underline-offset-2 hover:underline"
            data-testid="saved-checklist"
          >
            Install checklist from this comparison
          </Link>
        )}
        <Link href="/comparisons" className="ml-auto text-sm font-semibold text-ember-700 underline-offset-2 hover:underline">
          My comparisons
        </Link>
      </div>
      {!complete && <p className="text-sm text-tight-800">Fix the fields that need attention to save.</p>}
      {formOpen && (
        <form
          noValidate
          className="flex flex-wrap items-start gap-2"
          onSubmit={form.handleSubmit((v) => {
            setNotice(null);
            create.mutate(v.name);
          })}
        >
          <TextField
            label="Name of the comparison"
            className="min-w-[16rem] flex-1"
            maxLength={120}
            autoFocus
            error={form.formState.errors.name?.message}
            {...form.register("name")}
          />
          <div className="flex gap-2 pt-6">
            <Button type="submit" pending={create.isPending}>
              Save
            </Button>
            <Button type="button" variant="ghost" onClick={() => setFormOpen(false)}>
              Cancel
            </Button>
          </div>
        </form>
      )}
      <p role="status" aria-live="polite" className="min-h-0 text-sm text-basalt-700" data-testid="save-status">
        {notice}
        {notice && saved && !notice.startsWith("That saved") && (
          <>
            {" "}
            <Link href="/comparisons" className="font-semibold text-ember-700 underline">
              See all your comparisons
            </Link>
          </>
        )}
      </p>
    </div>
  );
}
