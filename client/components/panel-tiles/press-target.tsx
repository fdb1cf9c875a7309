import type { CSSProperties, KeyboardEvent, PointerEvent, ReactNode } from 'react';

type PressHandlers = {
  onPointerDown?: (e: PointerEvent<Element>) => void;
  onPointerUp?: (e: PointerEvent<Element>) => void;
  onPointerCancel?: (e: PointerEvent<Element>) => void;
  onLostPointerCapture?: (e: PointerEvent<Element>) => void;
  onKeyDown?: (e: KeyboardEvent<Element>) => void;
  onKeyUp?: (e: KeyboardEvent<Element>) => void;
  onBlur?: (e: { currentTarget: Element }) => void;
  onContextMenu: (e: { preventDefault(): void }) => void;
};

const isPressed = (el: Element) => el.getAttribute('data-pressed') === 'true';

/**
 * Handlers that act on pointer-down, not on click: the pressed look (`data-pressed`, drawn with no transition)
 * is set on the element before `onPress` runs, so it paints in the same frame as the touch. Enter and Space
 * act the same way.
 */
export function pressHandlers(isLive: boolean, onPress?: () => void, onRelease?: () => void): PressHandlers {
  const preventMenu = (e: { preventDefault(): void }) => e.preventDefault();
  if (!isLive) return { onContextMenu: preventMenu };
  const down = (el: Element) => {
    el.setAttribute('data-pressed', 'true');
    onPress?.();
  };
  const up = (el: Element) => {
    if (!isPressed(el)) return;
    el.removeAttribute('data-pressed');
    onRelease?.();
  };
  return {
    onPointerDown: (e) => {
      if (e.button !== 0) return;
      down(e.currentTarget);
      // Keep this pointer's up even if the finger slides off, so a push pad always releases.
      try {
        e.currentTarget.setPointerCapture(e.pointerId);
      } catch {
        // A pointer the browser no longer knows (e.g. already lifted): nothing to capture.
      }
    },
    onPointerUp: (e) => up(e.currentTarget),
    onPointerCancel: (e) => up(e.currentTarget),
    onLostPointerCapture: (e) => up(e.currentTarget),
    onKeyDown: (e) => {
      if ((e.key !== 'Enter' && e.key !== ' ') || e.repeat) return;
      e.preventDefault();
      down(e.currentTarget);
    },
    onKeyUp: (e) => {
      if (e.key === 'Enter' || e.key === ' ') up(e.currentTarget);
    },
    onBlur: (e) => up(e.currentTarget),
    onContextMenu: preventMenu,
  };
}

type PressTargetProps = {
  /** Accessible name. */
  label: string;
  isActive?: boolean;
  isDisabled?: boolean;
  /** Design mode: drawn, but not focusable and not pressable. */
  isStatic?: boolean;
  onPress?: () => void;
  onRelease?: () => void;
  className?: string;
  style?: CSSProperties;
  children: ReactNode;
};

/** A tile button that acts on pointer-down with its pressed look in the same frame (see pressHandlers). */
export function PressTarget({ label, isActive, isDisabled, isStatic, onPress, onRelease, className, style, children }: PressTargetProps) {
  return (
    <button
      type="button"
      aria-label={label}
      aria-pressed={isActive}
      disabled={isDisabled}
      tabIndex={isStatic ? -1 : undefined}
      data-active={isActive || undefined}
      className={className}
      style={style}
      {...pressHandlers(!isStatic && !isDisabled, onPress, onRelease)}
    >
      {children}
    </button>
  );
}
