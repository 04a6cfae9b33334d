import { provideIcons } from './app/core/icons/provide-icons';

/**
 * Providers every client unit test gets (angular.json, test "providersFile"): the app's icons,
 * registered as the app registers them, so components draw them as they do in the browser.
 */
export default [provideIcons()];
