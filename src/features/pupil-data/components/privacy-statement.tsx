import { RETENTION_LABELS, RETENTION_PHRASES } from "@contracts/retention";
import { ErrorState } from "@/components/ui/error-state";
import { CheckCircleIcon, LockIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useRetention } from "../api/get-retention";
import { formatDateTime } from "../utils/deleted-summary";

const NEVER = [
  "accounts, passwords or sign-in details: pupils never sign in",
  "e-mail addresses, phone numbers or surnames",
  "where a pupil is (location), or anything that identifies their device (a device fingerprint)",
  "photos, voice or video of pupils",
  "tracking or advertising of any kind",
] as const;

/**
 * What Linkleap stores about pupils, why, for how long (the school's own setting) and who can
 * see it. Read by admins, and linked for every member of staff.
 */
export function PrivacyStatement() {
  const retention = useRetention();
  return (
    <div className="grid gap-6">
      <Section title="What Linkleap keeps about pupils">
        <ul className="grid max-w-prose list-disc gap-2 pl-6">
          <li>
            <strong>Display names on class rosters</strong>: a first name and an initial, such as “Amira K.”, typed or uploaded by
            the class’s teacher. A roster is optional.
          </li>
          <li>
            <strong>Photos of real chain runs</strong>, uploaded by a class’s teacher to measure a run. They should show the
            apparatus, not pupils’ faces, but a photo may show people. Only the class’s teacher and the head of its department
            can see them; the teacher can delete a photo at any time, and its file is removed from the server at once (the
            measurements taken from it stay). Photos count as pupil data, so they also go with the nightly deletion and with
            “Delete pupil data now”. Bench data itself (pot heights, rises, speeds, notes) holds nothing about pupils.
          </li>
          <li>
            <strong>In live lessons</strong>: a display name for each lesson, typed by the pupil or picked from the roster; each
            pupil’s predictions and the reasons they give; and their written explanations.
          </li>
          <li>
            <strong>On the pupil’s own device</strong>, in the browser’s storage for that lesson only: a random token that lets
            the same device rejoin as the same pupil after a reload or a dropped connection, the name they joined with, and their
            own answers until the server has confirmed them. It is cleared when the lesson ends.
          </li>
        </ul>
        <p className="mt-4 max-w-prose">
          Names are there only so the teacher can tell answers apart. The board in the classroom shows no pupil names unless the
          teacher chooses to show them for that lesson.
        </p>
      </Section>

      <Section title="What Linkleap never collects from pupils">
        <ul className="grid max-w-prose gap-2">
          {NEVER.map((item) => (
            <li key={item} className="flex items-start gap-2">
              <LockIcon className="mt-1 size-5 text-ink-muted" />
              <span>No {item}.</span>
            </li>
          ))}
        </ul>
        <p className="mt-4 max-w-prose">Nothing about a pupil is public, and no pupil name is ever put in an e-mail.</p>
      </Section>

      <Section title="Why it is kept">
        <p className="max-w-prose">
          So that a teacher can run a lesson in which every pupil commits to a prediction before seeing the result, and can look
          back afterwards at what the class thought and how that changed. Nothing is used for anything else.
        </p>
      </Section>

      <Section title="Who can see it">
        <ul className="grid max-w-prose list-disc gap-2 pl-6">
          <li>The class’s own teacher, who can change and delete it.</li>
          <li>The head of the class’s department can look at the class and its roster without changing them; for lessons, they see how many trials were run and how many pupils took part, not individual pupils’ answers.</li>
          <li>School admins see how many names each class holds, never the names, and can delete a class’s pupil data.</li>
          <li>Nobody outside the school: it stays in the school’s own Linkleap database.</li>
        </ul>
      </Section>

      <Section title="How long it is kept">
        {retention.isPending ? (
          <SkeletonList rows={1} label="Loading the school's setting…" />
        ) : retention.isError ? (
          <ErrorState title="Could not load the school's setting" error={retention.error} onRetry={() => void retention.refetch()} retrying={retention.isFetching} />
        ) : (
          <div className="grid max-w-prose gap-3">
            <p className="flex items-start gap-2 text-lg">
              <CheckCircleIcon className="mt-1 size-5 text-ok" />
              <span>
                Your school keeps pupil data <strong>{RETENTION_PHRASES[retention.data.period]}</strong> (setting:{" "}
                {RETENTION_LABELS[retention.data.period].toLowerCase()}).
              </span>
            </p>
            <p>
              A deletion job runs every night. It deletes pupils’ lesson names, predictions, reasons and explanations once that
              long has passed since their lesson started, photos of real runs once that long has passed since they were
              uploaded, and the roster names of classes that have been archived for longer than that: a class still in use keeps
              its roster. The lessons themselves stay, with their set-ups and simulated results, and so do the numbers measured
              on photos, but without anything about a pupil.
            </p>
            <p>
              {retention.data.lastRun
                ? `The job last ran on ${formatDateTime(retention.data.lastRun.startedAt)}.`
                : "The job has not run yet."}
            </p>
            <p>
              A class’s teacher or a school admin can also delete a class’s pupil data at any time, with “Delete pupil data now”
              on the class page. Each deletion is recorded in the school’s audit log, with counts but no names.
            </p>
          </div>
        )}
      </Section>

      <p className="text-ink-muted">
        Questions about pupil data go to your school admin, who chooses how long it is kept.
      </p>
    </div>
  );
}
