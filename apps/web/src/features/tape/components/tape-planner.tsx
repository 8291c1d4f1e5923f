import { useState } from "react";
import { studioSpeedsIps, type EquipmentDto, type TapePlanDto, type TapeProductDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { usePlanTape } from "../api/move-tape.ts";
import { money } from "./tape-format.ts";

type SongRow = { title: string; minutes: string; takes: string };
const blank = (): SongRow => ({ title: "", minutes: "", takes: "1" });
const minutesText = (m: number) => `${Math.round(m * 100) / 100} min`;

type TapePlannerProps = { products: TapeProductDto[]; recorders: EquipmentDto[]; currency: string };

export function TapePlanner({ products, recorders, currency }: TapePlannerProps) {
  const plan = usePlanTape();
  const [songs, setSongs] = useState<SongRow[]>([blank(), blank(), blank()]);
  const [recorderId, setRecorderId] = useState("");
  const [speed, setSpeed] = useState("15");
  const [productId, setProductId] = useState("");
  const [reelLength, setReelLength] = useState("2500");
  const [allowance, setAllowance] = useState("1");
  const [problem, setProblem] = useState<string | null>(null);
  const recorder = recorders.find((r) => String(r.id) === recorderId);
  const speeds = recorder?.speedsIps.length ? recorder.speedsIps : [...studioSpeedsIps];

  const setSong = (i: number, patch: Partial<SongRow>) => setSongs(songs.map((s, j) => (j === i ? { ...s, ...patch } : s)));
  const chooseProduct = (id: string) => {
    setProductId(id);
    const product = products.find((p) => String(p.id) === id);
    if (product) setReelLength(String(product.lengthFt));
  };

  const submit = async () => {
    setProblem(null);
    const rows = songs.filter((s) => s.minutes.trim() !== "");
    if (rows.length === 0) return setProblem("Add at least one song with its length in minutes");
    try {
      await plan.mutateAsync({
        songs: rows.map((s) => ({ ...(s.title.trim() ? { title: s.title.trim() } : {}), minutes: Number(s.minutes), takes: Number(s.takes) })),
        speedIps: Number(speed),
        reelLengthFt: Number(reelLength),
        allowanceMinutes: Number(allowance),
        ...(recorder ? { recorderId: recorder.id } : {}),
        ...(productId ? { productId: Number(productId) } : {}),
      });
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };

  const result: TapePlanDto | undefined = plan.data;
  return (
    <div className="flex flex-col gap-4">
      <Card title="Songs and takes">
        <div className="flex flex-col gap-2">
          {songs.map((song, i) => (
            <div key={i} className="grid grid-cols-[1fr_7rem_6rem_auto] items-end gap-2">
              <Input aria-label={`Song ${i + 1} title`} placeholder={`Song ${i + 1}`} value={song.title} maxLength={120} onChange={(e) => setSong(i, { title: e.target.value })} />
              <Input aria-label={`Song ${i + 1} minutes`} placeholder="Minutes" inputMode="decimal" value={song.minutes} onChange={(e) => setSong(i, { minutes: e.target.value })} />
              <Input aria-label={`Song ${i + 1} takes`} placeholder="Takes" inputMode="numeric" value={song.takes} onChange={(e) => setSong(i, { takes: e.target.value })} />
              <Button variant="ghost" size="sm" aria-label={`Remove song ${i + 1}`} onClick={() => setSongs(songs.filter((_, j) => j !== i))} disabled={songs.length === 1}>
                Remove
              </Button>
            </div>
          ))}
          <div>
            <Button variant="secondary" size="sm" onClick={() => setSongs([...songs, blank()])}>
              Add a song
            </Button>
          </div>
        </div>
      </Card>
      <Card title="Tape">
        <div className="grid gap-4 sm:grid-cols-3">
          {recorders.length > 0 ? (
            <FormField label="Recorder" optional>
              {(field) => (
                <Select {...field} value={recorderId} onChange={(e) => setRecorderId(e.target.value)}>
                  <option value="">Any (7½, 15, 30 in/s)</option>
                  {recorders.map((r) => (
                    <option key={r.id} value={r.id}>
                      {r.name}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
          ) : null}
          <FormField label="Speed">
            {(field) => (
              <Select {...field} value={speed} onChange={(e) => setSpeed(e.target.value)}>
                {speeds.map((s) => (
                  <option key={s} value={s}>
                    {s} in/s
                  </option>
                ))}
              </Select>
            )}
          </FormField>
          <FormField label="Tape product" optional hint="Prices the plan and sets the reel length">
            {(field) => (
              <Select {...field} value={productId} onChange={(e) => chooseProduct(e.target.value)}>
                <option value="">None</option>
                {products.filter((p) => p.active).map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.name}
                  </option>
                ))}
              </Select>
            )}
          </FormField>
          <FormField label="Reel length (ft)">{(field) => <Input {...field} inputMode="numeric" value={reelLength} onChange={(e) => setReelLength(e.target.value)} />}</FormField>
          <FormField label="Head and tail allowance (min)">{(field) => <Input {...field} inputMode="decimal" value={allowance} onChange={(e) => setAllowance(e.target.value)} />}</FormField>
        </div>
        <div className="mt-4">
          <Button onClick={() => void submit()} pending={plan.isPending}>
            Plan reels
          </Button>
        </div>
      </Card>
      <FormAlert message={problem} />
      {result ? (
        <Card title={`${result.reelsNeeded} reel${result.reelsNeeded === 1 ? "" : "s"} needed`}>
          <p className="text-sm text-muted">
            {minutesText(result.minutesPerReel)} usable per reel ({minutesText(result.reelMinutes)} less the allowance) · {minutesText(result.totalMinutes)} of takes
            {result.totalPriceCents !== null ? ` · ${money(result.totalPriceCents, currency)} at today's price` : ""}
          </p>
          <ol className="mt-3 flex flex-col gap-2" aria-label="Reel layout">
            {result.reels.map((reel, i) => (
              <li key={i} className="rounded-md border border-line px-3 py-2 text-sm">
                <span className="font-semibold">Reel {i + 1}</span> <span className="text-muted">({minutesText(reel.minutesUsed)})</span>: {reel.songs.map((s) => `${s.title} × ${s.takes}`).join(", ")}
              </li>
            ))}
          </ol>
          {result.alternatives.length > 0 ? (
            <ul className="mt-3 text-sm" aria-label="Other speeds">
              {result.alternatives.map((a) => (
                <li key={a.speedIps}>
                  At {a.speedIps} in/s: {a.reelsNeeded === null ? "does not fit" : `${a.reelsNeeded} reel${a.reelsNeeded === 1 ? "" : "s"}`} ({minutesText(a.minutesPerReel)} per reel{a.note ? `; ${a.note}` : ""})
                </li>
              ))}
            </ul>
          ) : null}
        </Card>
      ) : null}
    </div>
  );
}
