import { useState } from "react";
import type { TeacherTrial } from "@contracts/lessons";
import { LESSON_LIMITS } from "@contracts/lesson-rules";
import { QUESTION_QUANTITIES, RIG_NAMES } from "@contracts/lesson-questions";
import { LINK_SHAPE_LABELS, LINK_SHAPES, RIG_IDS, type LinkShape, type RigId } from "@sim/index";
import { Button } from "@/components/ui/button";
import { ChoiceBar } from "@/components/ui/choice-bar";
import { SelectField, TextField } from "@/components/ui/field";
import { PlusIcon, RemoveIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import type { Send } from "../api/use-teacher-lesson";
import type { SetupDraftHandle } from "../hooks/use-setup-draft";
import { draftForRig, paramFieldsFor, unitsFor, withQuantity, type ParamField } from "../utils/setup-form";

const unitLabel = (unit: string) => (unit ? ` (${unit})` : "");

/**
 * The trial's set-up: rig, chain, parameters and question. Editable only while setting up;
 * afterwards the set-up is fixed (answers belong to it) and "Change and run again" starts a
 * copy as a new trial.
 */
export function SetupPanel({ trial, lessonId, setup, send, className }: {
  trial: TeacherTrial;
  lessonId: string;
  setup: SetupDraftHandle;
  send: Send;
  className?: string;
}) {
  const [copying, setCopying] = useState(false);
  const [copyError, setCopyError] = useState<unknown>(null);

  if (!setup.editable) {
    const again = async () => {
      setCopying(true);
      setCopyError(null);
      try {
        const { trialId } = await send("trial:add", { lessonId, copyOf: trial.id });
        await send("trial:show", { lessonId, trialId });
      } catch (error) {
        setCopyError(error);
      } finally {
        setCopying(false);
      }
    };
    return (
      <section aria-labelledby="setup-title" className={cx("grid gap-3", className)}>
        <h2 id="setup-title" className="text-xl font-bold">Set-up (fixed)</h2>
        <p className="text-ink-muted">Pupils have answered for this set-up, so it stays as it is. To try a change, run it as a new trial.</p>
        <ul className="grid gap-1">
          {trial.shownParams.map((p) => (
            <li key={p.key}>
              {p.label}: <span className="font-mono font-bold">{p.value}{p.unit ? ` ${p.unit}` : ""}</span>
            </li>
          ))}
        </ul>
        <Button variant="primary" busy={copying} onClick={() => void again()}>
          Change and run again
        </Button>
        {copyError ? (
          <Notice tone="danger" live="alert">
            <p>{errorMessage(copyError)}</p>
          </Notice>
        ) : null}
      </section>
    );
  }

  const { draft, change, errors } = setup;
  const fields = paramFieldsFor(draft.rig);
  const numberField = (field: ParamField) => (
    <TextField
      key={`${draft.rig}-${field.key}`}
      label={`${field.meta.label}${unitLabel(field.meta.unit)}`}
      hint={`${field.meta.min} to ${field.meta.max}${field.meta.unit ? ` ${field.meta.unit}` : ""}; empty for ${field.meta.default}`}
      inputMode={field.meta.integer ? "numeric" : "decimal"}
      value={draft.params[field.key] ?? ""}
      placeholder={String(field.meta.default)}
      error={errors[`params.${field.key}`]}
      onChange={(e) => {
        const text = e.target.value;
        change((d) => ({ ...d, params: { ...d.params, [field.key]: text } }));
      }}
    />
  );
  const q = draft.question;
  const quantities = QUESTION_QUANTITIES[draft.rig];
  return (
    <section aria-labelledby="setup-title" className={cx("grid gap-4", className)}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="setup-title" className="text-xl font-bold">Set-up</h2>
        <p role="status" className="text-sm text-ink-muted">
          {setup.status === "saving" ? "Saving…" : setup.status === "failed" ? "Not saved: see the messages below" : "Saved"}
        </p>
      </div>
      {setup.problem ? (
        <Notice tone="danger" live="alert">
          <p>{setup.problem}</p>
        </Notice>
      ) : null}
      <SelectField
        label="Rig"
        value={draft.rig}
        error={errors.rig}
        onChange={(e) => {
          const rig = e.target.value as RigId;
          change((d) => draftForRig(rig, d.linkShape));
        }}
      >
        {RIG_IDS.map((id) => (
          <option key={id} value={id}>
            {RIG_NAMES[id]}
          </option>
        ))}
      </SelectField>
      <fieldset className="grid gap-3">
        <legend className="mb-1 font-bold">Chain</legend>
        <SelectField
          label="Link shape"
          value={draft.linkShape}
          error={errors["params.linkShape"]}
          onChange={(e) => {
            const linkShape = e.target.value as LinkShape;
            change((d) => ({ ...d, linkShape }));
          }}
        >
          {LINK_SHAPES.map((s) => (
            <option key={s} value={s}>
              {LINK_SHAPE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        {fields.filter((f) => !f.advanced).map(numberField)}
      </fieldset>
      <details>
        <summary className="min-h-touch cursor-pointer font-bold">More settings</summary>
        <div className="mt-2 grid gap-3">{fields.filter((f) => f.advanced).map(numberField)}</div>
      </details>
      <fieldset className="grid gap-3">
        <legend className="mb-1 font-bold">Question</legend>
        <TextField
          label="What pupils are asked"
          value={q.prompt}
          maxLength={LESSON_LIMITS.prompt}
          error={errors["question.prompt"]}
          onChange={(e) => {
            const prompt = e.target.value;
            change((d) => ({ ...d, question: { ...d.question, prompt } }));
          }}
        />
        <SelectField label="What it asks about" value={q.quantity} error={errors["question.quantity"]} onChange={(e) => change((d) => withQuantity(d, e.target.value))}>
          {quantities.map((x) => (
            <option key={x.key} value={x.key}>
              {x.label}
            </option>
          ))}
        </SelectField>
        <ChoiceBar
          legend="How pupils answer"
          visibleLegend="Answer with"
          options={[
            { value: "number", label: "A number" },
            { value: "choice", label: "A choice" },
          ]}
          value={q.kind}
          onChange={(kind) =>
            change((d) => ({
              ...d,
              question: {
                ...d.question,
                kind,
                choices: kind === "choice" && d.question.choices.length === 0 ? [{ label: "", min: "", max: "" }, { label: "", min: "", max: "" }] : d.question.choices,
              },
            }))
          }
        />
        {q.kind === "number" ? (
          <SelectField label="Unit" value={q.unit} error={errors["question.unit"]} onChange={(e) => {
            const unit = e.target.value;
            change((d) => ({ ...d, question: { ...d.question, unit } }));
          }}>
            {unitsFor(draft.rig, q.quantity).map((u) => (
              <option key={u} value={u}>
                {u || "no unit (a ratio)"}
              </option>
            ))}
          </SelectField>
        ) : (
          <div className="grid gap-3">
            {errors["question.choices"] ? <p className="font-bold text-danger">{errors["question.choices"]}</p> : null}
            {q.choices.map((c, i) => {
              const set = (key: "label" | "min" | "max", value: string) =>
                change((d) => ({ ...d, question: { ...d.question, choices: d.question.choices.map((x, j) => (j === i ? { ...x, [key]: value } : x)) } }));
              return (
                <fieldset key={i} className="grid gap-2 rounded-control border border-line p-3 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-end">
                  <legend className="sr-only">Choice {i + 1}</legend>
                  <TextField label={`Choice ${i + 1}`} value={c.label} maxLength={LESSON_LIMITS.choiceLabel} error={errors[`question.choices.${i}.label`]} onChange={(e) => set("label", e.target.value)} />
                  <TextField label={`From${unitLabel(q.unit)}`} inputMode="decimal" value={c.min} error={errors[`question.choices.${i}.min`]} onChange={(e) => set("min", e.target.value)} />
                  <TextField label={`To${unitLabel(q.unit)}`} inputMode="decimal" value={c.max} error={errors[`question.choices.${i}.max`]} onChange={(e) => set("max", e.target.value)} />
                  <Button
                    variant="quiet"
                    icon={<RemoveIcon />}
                    disabled={q.choices.length <= LESSON_LIMITS.minChoices}
                    onClick={() => change((d) => ({ ...d, question: { ...d.question, choices: d.question.choices.filter((_, j) => j !== i) } }))}
                  >
                    Remove
                  </Button>
                </fieldset>
              );
            })}
            {q.choices.length < LESSON_LIMITS.maxChoices ? (
              <Button icon={<PlusIcon />} onClick={() => change((d) => ({ ...d, question: { ...d.question, choices: [...d.question.choices, { label: "", min: "", max: "" }] } }))}>
                Add a choice
              </Button>
            ) : null}
          </div>
        )}
        <label className="flex min-h-touch items-center gap-2">
          <input
            type="checkbox"
            className="size-5"
            checked={q.askReason}
            onChange={(e) => {
              const askReason = e.target.checked;
              change((d) => ({ ...d, question: { ...d.question, askReason } }));
            }}
          />
          Ask pupils for a reason too
        </label>
      </fieldset>
    </section>
  );
}
