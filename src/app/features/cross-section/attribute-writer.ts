/**
 * Writes element attributes and inline style properties only when their text changes, so a frame
 * that moves nothing touches nothing (an unchanged write can still invalidate style in a browser).
 */
export class AttributeWriter {
  private written = new WeakMap<Element, Map<string, string>>();

  /** Sets attribute `name` of `element` to `value` unless it already has it. */
  attr(element: Element, name: string, value: string): void {
    if (this.remember(element, name, value)) element.setAttribute(name, value);
  }

  /** Sets inline style property `name` (kebab-case) of `element` unless it already has `value`. */
  style(element: SVGElement | HTMLElement, name: string, value: string): void {
    if (this.remember(element, `style:${name}`, value)) element.style.setProperty(name, value);
  }

  /** Sets the text of `element` unless it already shows `value`. */
  text(element: Element, value: string): void {
    if (this.remember(element, 'text', value)) element.textContent = value;
  }

  /** Forgets every element (after a redraw replaced them). */
  clear(): void {
    this.written = new WeakMap();
  }

  private remember(element: Element, key: string, value: string): boolean {
    let values = this.written.get(element);
    if (!values) {
      values = new Map();
      this.written.set(element, values);
    }
    if (values.get(key) === value) return false;
    values.set(key, value);
    return true;
  }
}
