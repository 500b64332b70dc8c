// jsdom has no PointerEvent; a MouseEvent carries the same coordinates, which is all the views read.
if (typeof window.PointerEvent === 'undefined') {
  window.PointerEvent = class extends MouseEvent {
    readonly pointerId: number;
    constructor(type: string, init: PointerEventInit = {}) {
      super(type, init);
      this.pointerId = init.pointerId ?? 0;
    }
  } as typeof PointerEvent;
}
