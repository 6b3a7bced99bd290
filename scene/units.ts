/** The scene draws in metres (a root group scales the engine's millimetres by this). */
export const M = 0.001;
