/**
 * Words in shared/ are marked with `$localize` like the app's own, so each language's client
 * build carries them translated. In the browser the global is set by the app's polyfill; here it
 * is set for the server, the engine's tests and the command-line tools too, where words stay in
 * the source language (British English). Import this first in any shared file that marks words.
 */
import '@angular/localize/init';
