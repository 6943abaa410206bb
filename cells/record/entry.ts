// Entry point of the record build: take the page as loaded, then start the app.
import './capture';
import '../main';
