/** Entry: start the app's services, then mount the screens. */
import { mount } from 'svelte';
import App from './ui/App.svelte';
import './ui/theme.css';
import { deviceStatus } from './app/device-status.svelte.ts';
import { navigation } from './app/navigation.svelte.ts';
import { updateState } from './app/update-state.svelte.ts';
import { reopenLast, trackOpen } from './app/last-open.ts';

deviceStatus.start();
navigation.start();
updateState.start();
void reopenLast().finally(trackOpen);

mount(App, { target: document.getElementById('app')! });
