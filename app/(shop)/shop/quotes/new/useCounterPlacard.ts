"use client";
import { useMemo, useState } from "react";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { type VehicleKind, setupGeometry } from "@/lib/fitment";
import { type MeasureKey, PROFILE_QUANTITIES, type ProfileErrors, type ProfileField } from "@/lib/garage/loadProfile";
import { readProfileForm } from "@/lib/garage/loadProfileForm";
import { ApiError } from "@/lib/platform/client/api";
import { BODY_KEYS, type CounterBodyPoints } from "@/lib/shop/customers/counterBodyPoints";
import { type CounterPlacard, PLACARD_KEYS } from "@/lib/shop/customers/counterPlacard";
import { type Setup, toEngineSetup } from "@/lib/setup/model";
import { useMeasureEntries } from "@/app/(tools)/workspace/useMeasureEntries";

/**
 * The counter's placard fields: typed in the reader's inch/metric choice, read into SI by the
 * garage's own reader and checks (lib/garage/loadProfileForm), so the counter refuses what the
 * vehicle page refuses, with the same field names. The body points are not asked here. The
 * vehicle kind (truck or car) decides whether a passenger tire's load is derated (the engine's
 * 1.10 rule), so it is asked and sent with the placard. The body points (optional, for the trail
 * angles) are the same profile's and read with it. `fill` puts a saved vehicle's figures back.
 */
export function useCounterPlacard(currentSetup: Setup | null) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const { entries, set, note, fill: fillEntries } = useMeasureEntries<MeasureKey>(PROFILE_QUANTITIES, prefs);
  const [placardTire, setPlacardTire] = useState("");
  const [vehicleKind, setVehicleKind] = useState<VehicleKind>("light-truck");
  const [server, setServer] = useState<ProfileErrors>({});
  const [tried, setTried] = useState(false);

  const read = useMemo(() => {
    // The body points' checks take the current tire's diameter (they are measured with it).
    let current = { text: currentSetup?.tire ?? "", diameterMm: 0 };
    try {
      if (currentSetup) current = { text: currentSetup.tire, diameterMm: setupGeometry(toEngineSetup(currentSetup)).overallDiameterMm };
    } catch {
      // The setup's own fields report it; the placard's checks do not need it.
    }
    return readProfileForm({ entries, placardTire, vehicleKind }, prefs, current);
  }, [entries, placardTire, vehicleKind, prefs, currentSetup]);

  const errors: ProfileErrors = tried ? { ...read.errors, ...server } : server;
  const given = placardTire.trim() !== "" || PLACARD_KEYS.some((k) => entries[k].text.trim() !== "");
  /** The placard as the request carries it (SI with its units), null when nothing was typed, undefined while refused. */
  const value = () => {
    setTried(true);
    if (!given) return null;
    const p = read.profile;
    if (!p) return undefined;
    return {
      units: p.units,
      vehicleKind: p.vehicleKind,
      placardTire: p.placardTire,
      ...Object.fromEntries(PLACARD_KEYS.map((k) => [k, p[k]])),
    };
  };
  /** The body points as the request carries them (mm with their units), null when none was typed, undefined while refused. */
  const bodyPoints = (): CounterBodyPoints | null | undefined => {
    setTried(true);
    if (!BODY_KEYS.some((k) => entries[k].text.trim() !== "")) return null;
    const p = read.profile;
    if (!p) return undefined;
    return { units: p.units, ...Object.fromEntries(BODY_KEYS.map((k) => [k, p[k]])) } as CounterBodyPoints;
  };
  /** A refusal from the server, beside its field ("placard.<field>" and "bodyPoints.<field>" keys of the vehicle's request). */
  const fromServer = (err: unknown) => {
    const fe = err instanceof ApiError ? err.body.fieldErrors : undefined;
    if (!fe) return;
    const mine = Object.entries(fe).filter(([k]) => /(^|\.)(placard|bodyPoints)\./.test(k));
    setServer(Object.fromEntries(mine.map(([k, m]) => [k.replace(/^.*(placard|bodyPoints)\./, ""), m[0]])) as ProfileErrors);
  };
  const message = (k: ProfileField) => [errors[k], k === "placardTire" ? undefined : note(k)].filter(Boolean).join(" ") || undefined;
  const edit = (k: ProfileField, text: string) => {
    setServer(({ [k]: _, ...rest }) => rest);
    if (k === "placardTire") setPlacardTire(text);
    else set(k, text);
  };
  /** A saved vehicle's placard and body points (SI) in the fields, written in the screen's units; null empties them. */
  const fill = (p: CounterPlacard | null, b: CounterBodyPoints | null) => {
    fillEntries({
      ...(p && Object.fromEntries(PLACARD_KEYS.map((k) => [k, p[k]]))),
      ...(b && Object.fromEntries(BODY_KEYS.map((k) => [k, b[k]]))),
    });
    setPlacardTire(p?.placardTire ?? "");
    setVehicleKind(p?.vehicleKind ?? "light-truck");
    setServer({});
    setTried(false);
  };
  return { prefs, setPrefs, entries, placardTire, vehicleKind, setVehicleKind, edit, message, value, bodyPoints, fromServer, fill };
}

export type CounterPlacardState = ReturnType<typeof useCounterPlacard>;
