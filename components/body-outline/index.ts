export { BodyOutline, type BodyOutlineProps } from "./body-outline";
export { BodyOutlineReadOnly, type BodyOutlineReadOnlyProps } from "./body-outline-read-only";
export { BodyOutlineEditor, type BodyOutlineEditorProps } from "./body-outline-editor";
export { CHANNEL_STYLES } from "./channel-style";
export type { MarkerTuple, OutlineChannel } from "./types";
