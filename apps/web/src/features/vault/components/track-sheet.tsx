import { useState } from "react";
import type { ReelDetailDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useSaveTrackSheet } from "../api/reels.ts";

type Song = { title: string; start: string; keptTakes: string };

/** The reel's track sheet: an editor for the manager and the session's engineers, a sheet to read for everyone else. */
export function TrackSheet({ reel }: { reel: ReelDetailDto }) {
  return reel.canEditTrackSheet ? <TrackSheetEditor reel={reel} /> : <TrackSheetView reel={reel} />;
}

function TrackSheetView({ reel }: { reel: ReelDetailDto }) {
  const contents = new Map(reel.tracks.map((t) => [t.trackNo, t.contents]));
  return (
    <Card title="Track sheet">
      <ol className="grid gap-x-6 gap-y-1 sm:grid-cols-2" aria-label="Tracks">
        {Array.from({ length: reel.trackCount }, (_, i) => (
          <li key={i} className="flex gap-3 text-sm">
            <span className="w-16 shrink-0 font-semibold">Track {i + 1}</span>
            <span className={contents.get(i + 1) ? "" : "text-muted"}>{contents.get(i + 1) ?? "—"}</span>
          </li>
        ))}
      </ol>
      <h3 className="mt-4 mb-2 font-semibold">Songs</h3>
      {reel.songs.length === 0 ? (
        <p className="text-sm text-muted">No songs entered yet.</p>
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-muted">
              <th className="py-1 font-medium">From the head</th>
              <th className="py-1 font-medium">Song</th>
              <th className="py-1 font-medium">Kept takes</th>
            </tr>
          </thead>
          <tbody>
            {reel.songs.map((s, i) => (
              <tr key={i} className="border-t border-line">
                <td className="py-1 font-mono">{s.start}</td>
                <td className="py-1">{s.title}</td>
                <td className="py-1">{s.keptTakes ?? "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </Card>
  );
}

function TrackSheetEditor({ reel }: { reel: ReelDetailDto }) {
  const save = useSaveTrackSheet(reel.id);
  const toast = useToast();
  const [tracks, setTracks] = useState(() => Array.from({ length: reel.trackCount }, (_, i) => reel.tracks.find((t) => t.trackNo === i + 1)?.contents ?? ""));
  const [songs, setSongs] = useState<Song[]>(() => reel.songs.map((s) => ({ title: s.title, start: s.start, keptTakes: s.keptTakes ?? "" })));
  const setSong = (i: number, change: Partial<Song>) => setSongs((all) => all.map((s, j) => (j === i ? { ...s, ...change } : s)));

  const submit = () =>
    save.mutate(
      { tracks: tracks.map((contents, i) => ({ trackNo: i + 1, contents })), songs: songs.map((s) => ({ title: s.title, start: s.start, keptTakes: s.keptTakes })) },
      { onSuccess: () => toast("Track sheet saved") },
    );

  return (
    <Card
      title="Track sheet"
      actions={
        <Button size="sm" onClick={submit} pending={save.isPending}>
          Save track sheet
        </Button>
      }
    >
      <FormAlert message={save.isError ? errorMessage(save.error) : null} />
      <div className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
        {tracks.map((value, i) => (
          <label key={i} className="flex items-center gap-3 text-sm">
            <span className="w-16 shrink-0 font-semibold">Track {i + 1}</span>
            <Input aria-label={`Track ${i + 1}`} value={value} maxLength={120} onChange={(e) => setTracks((all) => all.map((t, j) => (j === i ? e.target.value : t)))} />
          </label>
        ))}
      </div>
      <h3 className="mt-5 mb-2 font-semibold">Songs</h3>
      <div className="flex flex-col gap-2">
        {songs.map((s, i) => (
          <div key={i} className="grid grid-cols-[6rem_1fr_1fr_auto] items-center gap-2">
            <Input aria-label={`Song ${i + 1} start (mm:ss)`} value={s.start} placeholder="00:30" onChange={(e) => setSong(i, { start: e.target.value })} />
            <Input aria-label={`Song ${i + 1} title`} value={s.title} onChange={(e) => setSong(i, { title: e.target.value })} />
            <Input aria-label={`Song ${i + 1} kept takes`} value={s.keptTakes} placeholder="take 3" onChange={(e) => setSong(i, { keptTakes: e.target.value })} />
            <Button size="sm" variant="ghost" onClick={() => setSongs((all) => all.filter((_, j) => j !== i))}>
              Remove
            </Button>
          </div>
        ))}
        <div>
          <Button size="sm" variant="secondary" onClick={() => setSongs((all) => [...all, { title: "", start: "", keptTakes: "" }])}>
            Add a song
          </Button>
        </div>
      </div>
    </Card>
  );
}
