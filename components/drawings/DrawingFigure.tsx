import type { ReactNode } from "react";
import type { Drawing } from "@/lib/engine/drawings/types";
import { DrawingSvg, type DrawingPhoto } from "./DrawingSvg";

interface Props {
  drawing: Drawing;
  caption?: ReactNode;
  highlight?: readonly string[];
  showKeepClear?: boolean;
  photo?: DrawingPhoto;
  /** Classes for the scrolling box around the drawing. The drawing takes the box's width and its own height. */
  boxClassName?: string;
}

/**
 * A drawing in a box that scrolls when the screen is too narrow to keep its text readable (the
 * box can take the keyboard focus so it can be scrolled without a pointer), with a caption.
 */
export function DrawingFigure({ drawing, caption, highlight, showKeepClear, photo, boxClassName = "" }: Props) {
  return (
    <figure className="flex min-w-0 flex-col gap-1">
      <div className={`overflow-auto rounded-lg border border-walnut-100 bg-white p-2 ${boxClassName}`} tabIndex={0} role="group" aria-label={`${drawing.title} (scrolls)`}>
        <DrawingSvg drawing={drawing} highlight={highlight} showKeepClear={showKeepClear} photo={photo} className="block h-auto w-full" />
      </div>
      {caption && <figcaption className="text-sm text-walnut-700">{caption}</figcaption>}
    </figure>
  );
}
