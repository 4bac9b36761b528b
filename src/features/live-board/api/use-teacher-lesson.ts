import { skipToken, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import type { BoardControl } from "@contracts/lesson-rules";
import { ApiError } from "@/lib/api-client";
import type { StaffSocket } from "@/lib/staff-socket";
import {
  mergeAnswersCounted,
  mergeExplanation,
  mergeParticipantsCounted,
  mergePrediction,
  replaceLesson,
  type LiveTeacherLesson,
} from "./lesson-cache";
import { sendCommand, type CommandPayload, type CommandReply, type CommandSocket, type LessonCommand } from "./lesson-commands";
import { lessonKeys } from "./lesson-keys";

/**
 * `connecting` / `live` / `reconnecting`: the usual; `outdated`: the server speaks another
 * protocol, reload the page; `refused`: the server will not show this lesson to this teacher;
 * `unavailable`: the socket code could not be loaded (offline).
 */
export type LessonConnection = "connecting" | "live" | "reconnecting" | "outdated" | "refused" | "unavailable";

export type Send = <E extends Exclude<LessonCommand, "lesson:watch">>(event: E, payload: CommandPayload<E>) => Promise<CommandReply<E>>;

export interface TeacherLessonHandle {
  lesson: LiveTeacherLesson | undefined;
  connection: LessonConnection;
  /** Why the lesson could not be watched (status `refused`). */
  refusal: ApiError | null;
  send: Send;
  /** Listens for the remote's playback requests (board:controlled); returns the way to stop. */
  onBoardControl: (listener: (action: BoardControl) => void) => () => void;
}

/**
 * The teacher's live view of one lesson (board and remote): opens the staff socket, asks to
 * watch the lesson on every (re)connect (the server forgets rooms when a socket drops), and
 * keeps the view in the query cache, merging the small broadcasts into it.
 */
export function useTeacherLesson(lessonId: string): TeacherLessonHandle {
  const queryClient = useQueryClient();
  const key = lessonKeys.teacher(lessonId);
  // Filled only by the socket; there is nothing to fetch.
  const query = useQuery<LiveTeacherLesson>({ queryKey: key, queryFn: skipToken, staleTime: Infinity });
  const [connection, setConnection] = useState<LessonConnection>("connecting");
  const [refusal, setRefusal] = useState<ApiError | null>(null);
  const socketRef = useRef<StaffSocket | null>(null);
  const controlListeners = useRef(new Set<(action: BoardControl) => void>());

  useEffect(() => {
    let cancelled = false;
    let socket: StaffSocket | null = null;
    const key = lessonKeys.teacher(lessonId);
    const update = (change: (lesson: LiveTeacherLesson) => LiveTeacherLesson) =>
      queryClient.setQueryData<LiveTeacherLesson>(key, (old) => (old ? change(old) : old));

    setConnection("connecting");
    import("@/lib/staff-socket")
      .then(({ openStaffSocket, isProtocolMismatch }) => {
        if (cancelled) return;
        socket = openStaffSocket();
        socketRef.current = socket;
        const watch = async () => {
          try {
            const lesson = await sendCommand(socket as unknown as CommandSocket, "lesson:watch", { lessonId });
            if (cancelled) return;
            queryClient.setQueryData(key, replaceLesson(lesson));
            setRefusal(null);
            setConnection("live");
          } catch (error) {
            if (cancelled) return;
            if (error instanceof ApiError && error.code !== "network_error") {
              setRefusal(error);
              setConnection("refused");
            } else {
              setConnection("reconnecting");
            }
          }
        };
        socket.on("connect", () => void watch());
        socket.on("disconnect", () => setConnection((s) => (s === "outdated" || s === "refused" ? s : "reconnecting")));
        socket.on("connect_error", (error) => {
          if (isProtocolMismatch(error)) {
            setConnection("outdated");
            socket?.disconnect();
          } else {
            setConnection("reconnecting");
          }
        });
        socket.on("lesson:teacher-changed", (lesson) => {
          if (lesson.id === lessonId) queryClient.setQueryData(key, replaceLesson(lesson));
        });
        socket.on("prediction:added", (payload) => update((l) => mergePrediction(l, payload)));
        socket.on("explanation:added", (payload) => update((l) => mergeExplanation(l, payload)));
        socket.on("answers:counted", (payload) => update((l) => mergeAnswersCounted(l, payload)));
        socket.on("participants:counted", (payload) => update((l) => mergeParticipantsCounted(l, payload)));
        socket.on("board:controlled", (payload) => {
          if (payload.lessonId === lessonId) for (const listener of controlListeners.current) listener(payload.action);
        });
      })
      .catch(() => {
        if (!cancelled) setConnection("unavailable");
      });

    return () => {
      cancelled = true;
      socket?.disconnect();
      socketRef.current = null;
    };
  }, [lessonId, queryClient]);

  const send = useCallback<Send>(async (event, payload) => {
    const socket = socketRef.current;
    // The socket code may still be loading (or failed to load) when the first click arrives.
    if (!socket) throw new ApiError(0, "network_error", "Still connecting to Linkleap. Try again in a moment.");
    return sendCommand(socket as unknown as CommandSocket, event, payload);
  }, []);

  const onBoardControl = useCallback((listener: (action: BoardControl) => void) => {
    controlListeners.current.add(listener);
    return () => void controlListeners.current.delete(listener);
  }, []);

  return { lesson: query.data, connection, refusal, send, onBoardControl };
}
