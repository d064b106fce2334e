// JSON carries no Infinity (JSON.stringify writes null); open-loop readings travel as the string "Infinity".

export function loopJsonReplacer(_key: string, value: unknown): unknown {
  return value === Infinity ? "Infinity" : value;
}

export function loopJsonReviver(_key: string, value: unknown): unknown {
  return value === "Infinity" ? Infinity : value;
}
