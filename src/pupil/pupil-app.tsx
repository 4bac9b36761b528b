import { useSyncExternalStore } from "react";
import { LogoMark } from "@/components/layout/logo-mark";
import { Notice } from "@/components/ui/notice";
import { LoadingState } from "@/components/ui/spinner";
import { CodeForm, NameForm } from "./join-forms";
import type { PupilClient } from "./pupil-client";
import { CARD } from "./pupil-ui";
import { TrialView } from "./trial-view";

export function PupilApp({ client }: { client: PupilClient }) {
  const state = useSyncExternalStore(client.subscribe, client.getState);
  const lesson = state.lesson;
  return (
    <div className="mx-auto flex min-h-dvh max-w-prose flex-col gap-4 px-3 py-3 sm:px-6 sm:py-6">
      <header className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <LogoMark />
        <span className="font-bold">Linkleap</span>
        {state.me ? (
          <span className="ml-auto text-ink-muted">
            Joined as <span className="font-bold text-ink">{state.me.displayName}</span>
          </span>
        ) : null}
      </header>

      {/* Connection: quiet when all is well, one polite line when not. */}
      <p role="status" className="min-h-6 text-ink-muted">
        {state.step === "ended" ? null : !state.connected ? (state.everConnected ? "Reconnecting…" : "Connecting…") : null}
      </p>

      {state.notice ? (
        <Notice tone="warn" live="status">
          {state.notice}
        </Notice>
      ) : null}

      <main className="flex flex-col gap-4">
        {state.step === "code" ? (
          <CodeForm
            initial={state.code ?? ""}
            busy={state.busy}
            error={state.error?.message ?? null}
            onCode={(code) => void client.lookup(code)}
          />
        ) : null}
        {state.step === "name" && state.lookup && state.code ? (
          <NameForm
            lookup={state.lookup}
            code={state.code}
            busy={state.busy}
            error={state.error?.message ?? null}
            onJoin={(who) => void client.join(who)}
            onChangeCode={() => client.changeCode()}
          />
        ) : null}
        {state.step === "joining" ? <LoadingState label="Joining the lesson…" /> : null}
        {state.step === "lesson" && lesson ? (
          lesson.trial ? (
            <TrialView client={client} state={state} trial={lesson.trial} className={lesson.className} />
          ) : (
            <section className={CARD}>
              <h1 className="text-2xl font-bold">{lesson.className}</h1>
              <p className="mt-2">You have joined. The first trial will appear here when your teacher starts it.</p>
            </section>
          )
        ) : null}
        {state.step === "ended" ? (
          <section className={CARD}>
            <h1 className="text-2xl font-bold">This lesson has ended</h1>
            <p className="mt-2">Thank you for taking part. You can close this page.</p>
          </section>
        ) : null}
      </main>
    </div>
  );
}
