/**
 * The application layer under both front ends (the window and the command line): a
 * network opened once ({@link org.shutline.app.Workspace}: network, topology, state as
 * recorded, trace, valve segments, id lookups), one settings object
 * ({@link org.shutline.app.AnalysisSettings}, read from a settings file by
 * {@link org.shutline.app.SettingsFile}) and the use cases that both call. Imports model
 * to report; imported only by ui and cli. No Swing.
 */
package org.shutline.app;
