"use client";
import { Badge, Card } from "@/components/ui/card";
import { FROM_MEETING, type BallotStateDto } from "@/models/ballot/state";
import { showDate, showTime, useBallotState } from "./api";
import { CloseBallotButton } from "./CloseBallotButton";
import { MeetingVoteForm } from "./MeetingVoteForm";
import { OpenBallotForm } from "./OpenBallotForm";
import { ResultView, TallyView, WhoVotedHow } from "./Tally";
import { VoteButtons } from "./VoteButtons";

function Status({ s }: { s: BallotStateDto }) {
  const b = s.ballot!;
  if (b.kind === "meeting") {
    return (
      <p data-testid="from-meeting"><Badge>Meeting vote</Badge> Taken at the meeting of {showDate(b.meetingDate!)}; {FROM_MEETING} ({b.openedByName}).
        {b.minutesRef ? <> Minutes: {b.minutesRef}.</> : null}</p>
    );
  }
  if (b.status === "open") return <p><Badge tone="action">Open</Badge> Opened by {b.openedByName}; voting closes {showTime(b.closesAt!)}.</p>;
  if (b.status === "withdrawn") return <p><Badge>Withdrawn</Badge> This ballot was withdrawn when a newer revision was circulated.</p>;
  return <p><Badge>Closed</Badge> Closed {showTime(b.closedAt!)}.</p>;
}

/** Who may vote on the ballot shown: fixed when it opened. */
function RollView({ s }: { s: BallotStateDto }) {
  if (!s.roll?.length) return null;
  return (
    <p className="text-sm text-ink-soft" data-testid="ballot-roll">
      The roll ({s.roll.length}), fixed when {s.ballot?.kind === "meeting" ? "the vote was recorded" : "the ballot opened"}: {s.roll.map((r) => `${r.name}${r.role === "chair" ? " (chair)" : ""}`).join(", ")}.
    </p>
  );
}

/** Why the chair cannot open a ballot or record a meeting's vote here, and what to do instead. */
function RouteNotes({ s }: { s: BallotStateDto }) {
  if (s.revisionState !== "circulated" || s.ballot?.status === "open") return null;
  const notes = [...new Set([s.openRefusal, s.meetingRefusal].filter((n): n is string => Boolean(n)))];
  return notes.map((n) => <p key={n} className="text-sm text-ink-soft" data-testid="route-note">{n}</p>);
}

function ChairTools({ s }: { s: BallotStateDto }) {
  if (!s.you.isChair) return null;
  const b = s.ballot;
  return (
    <div className="grid gap-4 border-t border-line pt-4" data-testid="chair-ballot-tools">
      <RouteNotes s={s} />
      {s.you.canClose && b && <CloseBallotButton revisionId={s.revisionId} ballotId={b.id} />}
      {s.you.canOpen && <OpenBallotForm revisionId={s.revisionId} number={s.revisionNumber} />}
      {s.you.canRecordMeeting && (s.electronicAllowed ? (
        <details className="rounded-md border border-line p-3">
          <summary className="min-h-11 cursor-pointer py-2 font-medium">Or record a vote taken at a meeting</summary>
          <MeetingVoteForm state={s} />
        </details>
      ) : <MeetingVoteForm state={s} />)}
    </div>
  );
}

/** The ballot on a revision: the rules in words, the open or latest ballot, live tally, votes and the chair's tools. */
export function BallotPanel({ revisionId, commissionId }: { revisionId: number; commissionId: number }) {
  const q = useBallotState(revisionId);
  if (q.isPending) return <Card title="Ballot"><p className="text-ink-soft">Loading the ballot…</p></Card>;
  if (q.isError) return <Card title="Ballot"><p role="alert" className="text-danger">The ballot could not be loaded: {q.error.message}</p></Card>;
  const s = q.data;
  const b = s.ballot;
  const live = b?.status === "open";
  return (
    <div data-testid="ballot-panel" data-commission={commissionId} data-ballot-status={b?.status ?? "none"}>
      <Card title="Ballot">
        <div className="grid gap-4">
          <details className="text-sm">
            <summary className="min-h-11 cursor-pointer py-2 font-medium">How this committee decides</summary>
            <ul className="list-disc space-y-1 pl-5 text-ink-soft" data-testid="ballot-rules">{s.rulesText.map((t) => <li key={t}>{t}</li>)}</ul>
          </details>
          {!b && <p>No vote has been held on Revision {s.revisionNumber} yet.{s.revisionState === "circulated" && !s.you.isChair ? " The chair opens the ballot." : ""}</p>}
          {b && (
            <div className="grid gap-3">
              <Status s={s} />
              <p className="font-serif text-lg">“{b.motion}”</p>
              {s.youMayVote && <VoteButtons revisionId={revisionId} ballotId={b.id} yourVote={s.yourVote} closesAt={b.closesAt} />}
              {live && !s.youMayVote && <p className="text-sm text-ink-soft">{s.you.isChair ? "Under the rules the chair does not vote." : "Only the people on this ballot's roll vote; you can follow the tally here."}</p>}
              {s.result && <ResultView result={s.result} />}
              {s.tally && <TallyView tally={s.tally} live={live} />}
              <RollView s={s} />
              {b.kind === "meeting" && !s.whoVotedHow.length ? <p className="text-sm text-ink-soft">The minutes record the counts only.</p> : <WhoVotedHow voters={s.whoVotedHow} />}
            </div>
          )}
          {s.earlier.length > 0 && (
            <p className="text-sm text-ink-soft">Earlier on this revision: {s.earlier.map((e) => `${e.kind === "meeting" ? "meeting vote" : "ballot"} ${e.status === "withdrawn" ? "withdrawn" : (e.outcomeLabel ?? e.status).toLowerCase()}`).join("; ")}.</p>
          )}
          <ChairTools s={s} />
        </div>
      </Card>
    </div>
  );
}
