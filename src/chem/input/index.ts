/** The one reader of user input and the one declaration of every input field (docs/input.md). */
export * from './quantity';
export * from './fields';
