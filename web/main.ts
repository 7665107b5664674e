// Entry point of the page: registers the components; <sl-app> does the rest.
import './components/sl-app';
