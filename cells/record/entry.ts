// Entry point of the record build: take the page as loaded, add the app's styles, then
// start the app.
import './capture';
import './app-css';
import '../main';
