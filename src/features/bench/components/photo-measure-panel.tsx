import { useEffect, useState, type ChangeEvent, type KeyboardEvent } from "react";
import { Circle, Image as KonvaImage, Layer, Line, Stage, Text } from "react-konva";
import type Konva from "konva";
import { HEIGHT_UNITS, PHOTO_MAX_TEXT, type BenchPhoto, type HeightUnit } from "@contracts/bench";
import { measurePhoto, PHOTO_MARK_LABELS, PHOTO_MARKS, referenceMetres, type PhotoMark, type PhotoMarks, type PixelPoint } from "@contracts/photo-measure";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { RemoveIcon, UploadIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { useDeleteBenchPhoto } from "../api/delete-bench-photo";
import { useBenchPhotos } from "../api/get-bench-photos";
import { useMeasureBenchPhoto } from "../api/measure-bench-photo";
import { useUploadBenchPhoto } from "../api/upload-bench-photo";

/** Each mark's colour, and a letter drawn beside it so colour is never the only cue. */
const MARK_STYLE: Record<PhotoMark, { colour: string; letter: string }> = {
  rim: { colour: "#e8590c", letter: "R" },
  crest: { colour: "#2b8a3e", letter: "H" },
  floor: { colour: "#1c7ed6", letter: "F" },
  referenceStart: { colour: "#c2255c", letter: "1" },
  referenceEnd: { colour: "#c2255c", letter: "2" },
};
const MAX_STAGE_WIDTH = 720;

/** Uploading photos of real runs, and measuring pot height and rise on one by marking five points. */
export function PhotoMeasurePanel({ classId }: { classId: string }) {
  const photos = useBenchPhotos(classId);
  const upload = useUploadBenchPhoto(classId);
  const remove = useDeleteBenchPhoto(classId);
  const [chosenId, setChosenId] = useState<string | null>(null);
  const list = photos.data ?? [];
  const chosen = list.find((p) => p.id === chosenId) ?? list[list.length - 1] ?? null;

  const pick = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = "";
    if (file) upload.mutate(file, { onSuccess: (photo) => setChosenId(photo.id) });
  };

  return (
    <div className="grid gap-3">
      <h3 className="text-lg font-bold">Or measure a photo of a run</h3>
      <Notice tone="info">
        <p>
          Photos should show the apparatus, not pupils’ faces. JPEG, PNG or WebP, up to {PHOTO_MAX_TEXT}. Only you and your head
          of department can see them, and you can delete them at any time.
        </p>
      </Notice>
      <label className="inline-flex w-fit cursor-pointer items-center gap-2 rounded-control border-2 border-line-strong px-4 min-h-touch font-bold focus-within:outline-2">
        <UploadIcon /> {upload.isPending ? "Uploading…" : "Upload a photo"}
        <input type="file" accept="image/jpeg,image/png,image/webp" className="sr-only" data-testid="bench-photo-input" onChange={pick} />
      </label>
      {upload.error ? <FormErrorNotice>{errorMessage(upload.error)}</FormErrorNotice> : null}
      {photos.isError ? <FormErrorNotice>{errorMessage(photos.error)}</FormErrorNotice> : null}
      {list.length > 1 ? (
        <SelectField label="Photo" value={chosen?.id ?? ""} onChange={(e) => setChosenId(e.target.value)}>
          {list.map((p, i) => (
            <option key={p.id} value={p.id}>Photo {i + 1}, uploaded {new Date(p.createdAt).toLocaleString()}</option>
          ))}
        </SelectField>
      ) : null}
      {chosen ? (
        <>
          <PhotoMarker key={chosen.id} classId={classId} photo={chosen} />
          <Button variant="quiet" icon={<RemoveIcon />} busy={remove.isPending} onClick={() => remove.mutate(chosen.id)} className="w-fit">
            Delete this photo (runs measured on it are kept)
          </Button>
        </>
      ) : null}
    </div>
  );
}

function useImage(url: string) {
  const [image, setImage] = useState<HTMLImageElement | null>(null);
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    const img = new window.Image();
    img.onload = () => setImage(img);
    img.onerror = () => setFailed(true);
    img.src = url;
    return () => {
      img.onload = null;
      img.onerror = null;
    };
  }, [url]);
  return { image, failed };
}

function PhotoMarker({ classId, photo }: { classId: string; photo: BenchPhoto }) {
  const { image, failed } = useImage(photo.url);
  const [marks, setMarks] = useState<Partial<PhotoMarks>>({});
  const [selected, setSelected] = useState<PhotoMark>("rim");
  const [length, setLength] = useState("");
  const [unit, setUnit] = useState<HeightUnit>("cm");
  const [note, setNote] = useState("");
  const [savedText, setSavedText] = useState<string | null>(null);
  const measure = useMeasureBenchPhoto(classId);

  if (failed) return <FormErrorNotice>This photo could not be loaded.</FormErrorNotice>;
  if (!image) return <p>Loading the photo…</p>;

  const availableWidth = typeof window === "undefined" ? MAX_STAGE_WIDTH : Math.max(240, window.innerWidth - 64);
  const scale = Math.min(1, MAX_STAGE_WIDTH / image.naturalWidth, availableWidth / image.naturalWidth);
  const complete = PHOTO_MARKS.every((m) => marks[m]);
  const lengthValue = Number(length.replace(",", "."));
  const result = complete ? measurePhoto(marks as PhotoMarks, referenceMetres(lengthValue, unit)) : null;

  const place = (mark: PhotoMark, point: PixelPoint) => {
    setSavedText(null);
    const clamped = {
      x: Math.round(Math.min(image.naturalWidth, Math.max(0, point.x))),
      y: Math.round(Math.min(image.naturalHeight, Math.max(0, point.y))),
    };
    setMarks((m) => ({ ...m, [mark]: clamped }));
  };
  const onStageClick = (event: Konva.KonvaEventObject<MouseEvent | TouchEvent>) => {
    const pos = event.target.getStage()?.getPointerPosition();
    if (!pos) return;
    place(selected, { x: pos.x / scale, y: pos.y / scale });
    // Move on to the next mark not yet placed, so five clicks place all five.
    const next = PHOTO_MARKS.find((m) => m !== selected && !marks[m]);
    if (next) setSelected(next);
  };
  const onKeyDown = (event: KeyboardEvent) => {
    const step = event.shiftKey ? 10 : 1;
    const d = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, -step], ArrowDown: [0, step] }[event.key];
    if (!d) return;
    event.preventDefault();
    const current = marks[selected] ?? { x: image.naturalWidth / 2, y: image.naturalHeight / 2 };
    place(selected, { x: current.x + d[0]!, y: current.y + d[1]! });
  };
  const save = () => {
    if (!result?.ok) return;
    measure.mutate(
      { photoId: photo.id, input: { marks: marks as PhotoMarks, referenceLength: lengthValue, referenceUnit: unit, note } },
      { onSuccess: (run) => setSavedText(`Saved: pot height ${run.potHeightM} m, rise ${run.riseM} m.`) },
    );
  };

  return (
    <div className="grid gap-3">
      <p className="text-ink-muted">
        Choose a mark, then click or tap its place on the photo (or move it with the arrow keys while the photo has focus; Shift
        moves 10 pixels; or type its pixel position). This works when the camera faces the set-up squarely and the object of
        known length stands in the same plane as the chain.
      </p>
      <fieldset className="grid gap-2 sm:grid-cols-2">
        <legend className="mb-1 font-bold">Mark to place</legend>
        {PHOTO_MARKS.map((mark) => (
          <label key={mark} className="flex min-h-touch cursor-pointer items-center gap-2 rounded-control border border-line px-3">
            <input type="radio" name={`mark-${photo.id}`} value={mark} checked={selected === mark} onChange={() => setSelected(mark)} />
            <span aria-hidden="true" className="font-mono font-bold" style={{ color: MARK_STYLE[mark].colour }}>{MARK_STYLE[mark].letter}</span>
            <span>{PHOTO_MARK_LABELS[mark]}</span>
            <span className="ml-auto font-mono text-sm text-ink-muted">{marks[mark] ? `${marks[mark]!.x}, ${marks[mark]!.y}` : "not placed"}</span>
          </label>
        ))}
      </fieldset>
      <div
        tabIndex={0}
        role="application"
        aria-label={`Photo for marking. Selected mark: ${PHOTO_MARK_LABELS[selected]}. Arrow keys move it.`}
        onKeyDown={onKeyDown}
        className="w-fit max-w-full overflow-hidden rounded-control border-2 border-line-strong focus:outline-4"
        data-testid="photo-stage"
        data-scale={scale}
      >
        <Stage width={image.naturalWidth * scale} height={image.naturalHeight * scale} onClick={onStageClick} onTap={onStageClick}>
          <Layer>
            <KonvaImage image={image} width={image.naturalWidth * scale} height={image.naturalHeight * scale} />
            {marks.referenceStart && marks.referenceEnd ? (
              <Line points={[marks.referenceStart.x * scale, marks.referenceStart.y * scale, marks.referenceEnd.x * scale, marks.referenceEnd.y * scale]} stroke="#c2255c" strokeWidth={2} dash={[6, 4]} listening={false} />
            ) : null}
            {PHOTO_MARKS.map((mark) => {
              const p = marks[mark];
              if (!p) return null;
              return (
                <Circle key={mark} x={p.x * scale} y={p.y * scale} radius={7} stroke={MARK_STYLE[mark].colour} strokeWidth={3} listening={false} />
              );
            })}
            {PHOTO_MARKS.map((mark) => {
              const p = marks[mark];
              if (!p) return null;
              return <Text key={`${mark}-t`} x={p.x * scale + 10} y={p.y * scale - 8} text={MARK_STYLE[mark].letter} fontSize={16} fontStyle="bold" fill={MARK_STYLE[mark].colour} stroke="#ffffff" strokeWidth={0.5} listening={false} />;
            })}
          </Layer>
        </Stage>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label={`${PHOTO_MARK_LABELS[selected]}: x (pixels)`} inputMode="numeric" value={marks[selected]?.x ?? ""} onChange={(e) => place(selected, { x: Number(e.target.value), y: marks[selected]?.y ?? 0 })} />
        <TextField label={`${PHOTO_MARK_LABELS[selected]}: y (pixels)`} inputMode="numeric" value={marks[selected]?.y ?? ""} onChange={(e) => place(selected, { x: marks[selected]?.x ?? 0, y: Number(e.target.value) })} />
        <TextField label={`Known length (${unit})`} hint="The real length between marks 1 and 2" inputMode="decimal" value={length} onChange={(e) => setLength(e.target.value)} />
        <SelectField label="Unit of the known length" value={unit} onChange={(e) => setUnit(e.target.value as HeightUnit)}>
          {HEIGHT_UNITS.map((u) => (<option key={u} value={u}>{u}</option>))}
        </SelectField>
        <TextField label="Note, optional" value={note} onChange={(e) => setNote(e.target.value)} maxLength={200} />
      </div>
      <div aria-live="polite" data-testid="photo-result">
        {!complete ? <p>Place all five marks to see the heights.</p> : null}
        {result && !result.ok ? <FormErrorNotice>{result.message}</FormErrorNotice> : null}
        {result?.ok ? (
          <p className="text-lg">
            Pot height <strong className="font-mono">{result.potHeightM.toFixed(3)} m</strong>, rise{" "}
            <strong className="font-mono">{result.riseM.toFixed(3)} m</strong> (scale {(result.metresPerPixel * 1000).toFixed(2)} mm per pixel).
          </p>
        ) : null}
      </div>
      {measure.error ? <FormErrorNotice>{errorMessage(measure.error)}</FormErrorNotice> : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="primary" disabled={!result?.ok} busy={measure.isPending} onClick={save}>Save as a real run</Button>
        {savedText ? <p role="status" className="font-bold text-ok">{savedText}</p> : null}
      </div>
    </div>
  );
}
