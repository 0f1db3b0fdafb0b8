// TEST STAND-IN: a module without a deriveObject export, to test the error raised when the
// derive module cannot be used.
export const notDeriveObject = 1;
