import '@fontsource/noto-sans/400.css';
import '@fontsource/noto-sans/600.css';
import '@quasar/extras/material-icons/material-icons.css';
import 'quasar/src/css/index.sass';
import './css/app.scss';
import { createPinia } from 'pinia';
import { Dialog, Notify, Quasar } from 'quasar';
import iconSet from 'quasar/icon-set/material-icons';
import { createApp } from 'vue';
import App from './App.vue';
import { installApi } from './boot/api';
import { router } from './router';

// eslint-disable-next-line @typescript-eslint/no-unsafe-argument -- typescript-eslint cannot type a .vue import; vue-tsc checks this line
const app = createApp(App);
// an empty table is not a warning: show an information icon instead of the default triangle
const icons = { ...iconSet, table: { ...iconSet.table, warning: 'info_outline' } };
app.use(Quasar, { plugins: { Notify, Dialog }, iconSet: icons, config: { notify: { position: 'top', timeout: 5000 } } });
app.use(createPinia());
app.use(router);
installApi(router);
app.mount('#app');
