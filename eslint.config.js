import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const shareDown = 'Move what two features share to src/components/ or src/lib/.';

/** Each folder under src/features, so a new feature is fenced in as soon as it exists. */
const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/**
 * A relative path written `levels` folders up or more. Paths are matched as written, not
 * resolved, so each depth inside a feature gets the count that would climb out of it.
 */
const climbing = (levels) => ({
  regex: `^(\\./)?(\\.\\./){${levels}}`,
  message: `This path leaves the feature's folder. ${shareDown}`,
});

/**
 * Features never import each other: a feature reads its own folder, src/components/, src/lib/
 * and the rest of the floor below it. Files up to three folders inside a feature are matched
 * exactly; any deeper may climb three folders at most.
 */
const featureBoundaries = features.flatMap((feature) => {
  const otherFeatures = {
    group: ['@/features/*', `!@/features/${feature}`],
    message: `Features do not import each other. ${shareDown}`,
  };
  const fence = (files, levels) => ({
    files,
    rules: {
      'no-restricted-imports': ['error', { patterns: [otherFeatures, climbing(levels)] }],
    },
  });
  return [
    fence([`src/features/${feature}/**/*.{ts,tsx}`], 4),
    ...[0, 1, 2, 3].map((depth) =>
      fence([`src/features/${feature}/${'*/'.repeat(depth)}*.{ts,tsx}`], depth + 1),
    ),
  ];
});

/**
 * Every user string reaches the page as text: these take HTML, so they are refused in the client
 * (a fixed markup string in a Leaflet icon is the one thing allowed, as a literal).
 */
const htmlSink = 'This takes HTML: put user strings on the page as text (a text node, JSX).';
const htmlSinks = [
  "JSXAttribute[name.name='dangerouslySetInnerHTML']",
  'AssignmentExpression > MemberExpression.left[property.name=/^(innerHTML|outerHTML)$/]',
  'CallExpression[callee.property.name=/^(insertAdjacentHTML|createContextualFragment|parseFromString)$/]',
  "CallExpression[callee.object.name='document'][callee.property.name=/^write(ln)?$/]",
  'CallExpression[callee.property.name=/^(bindPopup|bindTooltip|setPopupContent|setTooltipContent|setContent)$/][arguments.0.type=/^(Literal|TemplateLiteral|BinaryExpression|Identifier)$/]',
  "CallExpression[callee.property.name='divIcon'] Property[key.name='html'][value.type!='Literal']",
].map((selector) => ({ selector, message: htmlSink }));

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'data', 'coverage', 'public'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-syntax': ['error', ...htmlSinks],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['@/*', '../server/*', '../../server/*', 'express', 'react', 'knex'] },
      ],
    },
  },
  ...featureBoundaries,
  {
    // The floor below the features: it serves every feature and the app, and knows none of them.
    files: ['src/components/**/*.{ts,tsx}', 'src/lib/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/features/*', '@/app/*'],
              message: 'src/components/ and src/lib/ sit below the features and the app.',
            },
            {
              regex: '^(\\.\\./)+(features|app)(/|$)',
              message: 'src/components/ and src/lib/ sit below the features and the app.',
            },
          ],
        },
      ],
    },
  },
  prettier,
);
