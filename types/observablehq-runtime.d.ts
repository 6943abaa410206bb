// @observablehq/runtime 6 ships no types; only what Loadtrace uses is declared.
declare module '@observablehq/runtime' {
  export interface Observer {
    pending?(): void;
    fulfilled?(value: unknown, name: string | null): void;
    rejected?(error: unknown, name: string | null): void;
  }
  export class Variable {
    define(name: string | null, inputs: string[], definition: (...args: any[]) => unknown): this;
    define(name: string | null, definition: (...args: any[]) => unknown): this;
    delete(): void;
  }
  export class Module {
    variable(observer?: Observer, options?: { shadow?: Record<string, unknown> }): Variable;
    define(name: string, inputs: string[], definition: (...args: any[]) => unknown): Variable;
    redefine(name: string, inputs: string[], definition: (...args: any[]) => unknown): Variable;
    value(name: string): Promise<unknown>;
  }
  export class Runtime {
    constructor(builtins?: Record<string, unknown>, global?: (name: string) => unknown);
    module(): Module;
    dispose(): void;
  }
  export class RuntimeError extends Error {
    input?: string;
  }
}
