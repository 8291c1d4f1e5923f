import { useEffect, useId, useState, type ReactNode } from "react";
import type { TimeClockDto } from "@takeup/domain";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { Spinner } from "../../../components/ui/spinner.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { cx } from "../../../lib/cx.ts";
import { formatStudioDayTime, formatStudioTime, formatTimeRange, studioParts } from "../../../lib/studio-time.ts";
import { useClockIn } from "../api/clock-in.ts";
import { useClockOut } from "../api/clock-out.ts";
import { useEndBreak } from "../api/end-break.ts";
import { useTimeClock } from "../api/get-time-clock.ts";
import { useStartBreak } from "../api/start-break.ts";
import { breakMinutes, formatWorked, workedMinutesSoFar } from "./durations.ts";
import { inStudioTime } from "../../../lib/studio-message.ts";
import { WeekSoFar } from "./week-so-far.tsx";

const SHOP = "shop";

/** The time now, moved on every `everyMs`, so running totals tick without refetching. */
function useNow(everyMs: number): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs]);
  return now;
}

/** The engineer's clock at the console: one big button, the state in big words, the week so far. */
export function TimeClock({ timeZone }: { timeZone: string }) {
  const clock = useTimeClock();
  if (clock.isPending) return <LoadingState label="Loading your clock…" />;
  if (clock.isError) return <ErrorState error={clock.error} onRetry={() => void clock.refetch()} />;
  return <ClockView state={clock.data} timeZone={timeZone} />;
}

function ClockView({ state, timeZone }: { state: TimeClockDto; timeZone: string }) {
  const toast = useToast();
  const now = useNow(30_000);
  const clockIn = useClockIn();
  const clockOut = useClockOut();
  const startBreak = useStartBreak();
  const endBreak = useEndBreak();
  const busy = clockIn.isPending || clockOut.isPending || startBreak.isPending || endBreak.isPending;

  const sessions = state.sessionsNow;
  const [choice, setChoice] = useState<string | null>(null);
  // A choice stays only while its session is still on offer; otherwise the first session is the default.
  const chosen = choice !== null && (choice === SHOP || sessions.some((s) => String(s.id) === choice)) ? choice : sessions[0] ? String(sessions[0].id) : SHOP;

  const open = state.openEntry;
  const failed = (error: unknown) => toast(inStudioTime(errorMessage(error), timeZone), "error");
  const time = (iso: string) => formatStudioTime(iso, timeZone);

  const onClockIn = () =>
    clockIn.mutate(chosen === SHOP ? {} : { bookingId: Number(chosen) }, {
      onSuccess: (entry) => toast(`Clocked in at ${time(entry.startedAt)}${entry.booking ? ` for ${entry.booking.clientName}` : " for shop time"}`),
      onError: failed,
    });
  const onClockOut = () =>
    clockOut.mutate(undefined, {
      onSuccess: (entry) =>
        toast(`Clocked out${entry.endedAt ? ` at ${time(entry.endedAt)}` : ""}${entry.workedMinutes !== null ? `: ${formatWorked(entry.workedMinutes)} worked` : ""}`),
      onError: failed,
    });
  const onBreak = () =>
    state.onBreak
      ? endBreak.mutate(undefined, { onSuccess: () => toast("Break over: back on the clock"), onError: failed })
      : startBreak.mutate(undefined, {
          onSuccess: (entry) => {
            const running = entry.breaks.find((b) => b.endedAt === null);
            toast(running ? `Break started at ${time(running.startedAt)}` : "Break started");
          },
          onError: failed,
        });

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-label="Clock" className="flex min-w-0 flex-col gap-5 rounded-lg border border-line bg-card p-4 sm:p-6">
        <ClockState state={state} now={now} timeZone={timeZone} />
        {open?.flags.includes("open_too_long") ? (
          <p role="alert" className="rounded-md border border-alert/40 bg-alert-wash px-3 py-2 font-medium text-alert">
            You have been clocked in for over {Math.floor((now - Date.parse(open.startedAt)) / 3_600_000)} hours — clock out, then ask for a correction if
            needed.
          </p>
        ) : null}
        {!open && sessions.length > 0 ? (
          <SessionChoice sessions={sessions} value={chosen} onChange={setChoice} timeZone={timeZone} disabled={busy} />
        ) : null}
        <div className="flex flex-col gap-3">
          <button
            type="button"
            onClick={open ? onClockOut : onClockIn}
            disabled={busy}
            aria-busy={clockIn.isPending || clockOut.isPending || undefined}
            className={cx(
              "flex min-h-24 w-full items-center justify-center gap-3 rounded-xl px-6 text-3xl font-bold tracking-tight shadow-sm transition-colors select-none",
              "touch-manipulation disabled:cursor-not-allowed disabled:opacity-70 sm:max-w-md",
              open ? "border-2 border-ink bg-ink text-paper hover:bg-ink/85" : "border-2 border-rust-deep bg-rust text-white hover:bg-rust-deep",
            )}
          >
            {clockIn.isPending || clockOut.isPending ? <Spinner className="[&_svg]:size-7" /> : null}
            {open ? "Clock out" : "Clock in"}
          </button>
          {open ? (
            <button
              type="button"
              onClick={onBreak}
              disabled={busy}
              aria-busy={startBreak.isPending || endBreak.isPending || undefined}
              className={cx(
                "flex h-14 w-full items-center justify-center gap-2 rounded-lg border-2 px-5 text-lg font-semibold transition-colors",
                "touch-manipulation disabled:cursor-not-allowed disabled:opacity-70 sm:max-w-md",
                state.onBreak ? "border-rust bg-rust-wash text-rust-deep hover:bg-rust-wash/70" : "border-line-strong bg-card text-ink hover:bg-paper-deep",
              )}
            >
              {startBreak.isPending || endBreak.isPending ? <Spinner /> : null}
              {state.onBreak ? "End break" : "Start break"}
            </button>
          ) : null}
        </div>
        <p className="text-sm text-muted">Times are studio time ({timeZone}).</p>
      </section>
      <WeekSoFar week={state.week} timeZone={timeZone} />
    </div>
  );
}

function ClockState({ state, now, timeZone }: { state: TimeClockDto; now: number; timeZone: string }) {
  const open = state.openEntry;
  if (!open) {
    return (
      <div>
        <p className="text-3xl font-semibold tracking-tight sm:text-4xl">Not clocked in</p>
        <p className="mt-1 text-muted">Clock in when you start work, at a session or for shop time.</p>
      </div>
    );
  }
  const startedToday = studioParts(open.startedAt, timeZone).date === studioParts(new Date(now).toISOString(), timeZone).date;
  const since = startedToday ? formatStudioTime(open.startedAt, timeZone) : formatStudioDayTime(open.startedAt, timeZone);
  const worked = workedMinutesSoFar(open.startedAt, open.breaks, now);
  const runningBreak = open.breaks.find((b) => b.endedAt === null);
  const breaks = breakMinutes(open.breaks, now);
  return (
    <div>
      <p className="text-3xl font-semibold tracking-tight tabular-nums sm:text-4xl">
        Clocked in since {since} — {formatWorked(worked)}
      </p>
      <p className="mt-1 text-lg">{open.booking ? `${open.booking.clientName} — ${open.booking.roomName}` : "Shop time"}</p>
      {runningBreak ? (
        <p className="mt-2 inline-flex rounded-md bg-rust-wash px-2.5 py-1 font-semibold text-rust-deep">
          On a break since {formatStudioTime(runningBreak.startedAt, timeZone)}
        </p>
      ) : null}
      {breaks > 0 ? <p className="mt-1 text-sm text-muted">Breaks so far: {formatWorked(breaks)}, not counted as worked time.</p> : null}
    </div>
  );
}

type SessionChoiceProps = {
  sessions: TimeClockDto["sessionsNow"];
  value: string;
  onChange: (value: string) => void;
  timeZone: string;
  disabled: boolean;
};

function SessionChoice({ sessions, value, onChange, timeZone, disabled }: SessionChoiceProps) {
  const name = useId();
  return (
    <fieldset className="min-w-0" disabled={disabled}>
      <legend className="mb-2 text-lg font-semibold">Which session?</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {sessions.map((session) => (
          <ChoiceCard
            key={session.id}
            name={name}
            value={String(session.id)}
            checked={value === String(session.id)}
            onChange={onChange}
            label={`${session.clientName} — ${session.roomName}, ${formatTimeRange(session.startsAt, session.endsAt, timeZone)}`}
            detail={session.title}
          />
        ))}
        <ChoiceCard name={name} value={SHOP} checked={value === SHOP} onChange={onChange} label="Shop time" detail="Work that is not a session: maintenance, setup, errands." />
      </div>
    </fieldset>
  );
}

type ChoiceCardProps = { name: string; value: string; checked: boolean; onChange: (value: string) => void; label: string; detail?: ReactNode };

function ChoiceCard({ name, value, checked, onChange, label, detail }: ChoiceCardProps) {
  const id = useId();
  return (
    <div
      className={cx(
        "relative flex min-h-16 items-start gap-3 rounded-lg border-2 px-3 py-3 transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-rust",
        checked ? "border-rust bg-rust-wash/60" : "border-line bg-card hover:border-line-strong",
      )}
    >
      <input
        id={id}
        type="radio"
        name={name}
        value={value}
        checked={checked}
        onChange={() => onChange(value)}
        aria-describedby={detail ? `${id}-detail` : undefined}
        className="mt-1 size-5 shrink-0 accent-rust focus-visible:outline-none"
      />
      <div className="min-w-0">
        {/* The label covers the whole card, so a tap anywhere on it picks it. */}
        <label htmlFor={id} className="font-semibold break-words after:absolute after:inset-0 after:content-['']">
          {label}
        </label>
        {detail ? (
          <p id={`${id}-detail`} className="text-sm text-muted">
            {detail}
          </p>
        ) : null}
      </div>
    </div>
  );
}
