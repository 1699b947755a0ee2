/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.deck;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRunnable;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.DocumentEvent;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IDocumentListener;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContentAssistant;
import org.eclipse.jface.text.ITextPresentationListener;
import org.eclipse.jface.text.ITextViewerExtension4;
import org.eclipse.jface.text.TextPresentation;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.custom.StyleRange;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IFileEditorInput;
import org.eclipse.ui.editors.text.TextEditor;
import org.eclipse.ui.texteditor.ITextEditorActionDefinitionIds;
import org.eclipse.ui.texteditor.ContentAssistAction;
import org.eclipse.ui.views.contentoutline.ContentOutlinePage;
import org.eclipse.ui.views.contentoutline.IContentOutlinePage;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.Issue;

/**
 * The deck editor. Keyword, number, unit and comment colours come from a rule-based scanner fed with
 * the grammar's keywords; 400 ms after each change a job parses and validates the text with the Xtext
 * runtime and turns the issues into problem markers on the file (shown in the editor's ruler, as
 * squiggles and in the Problems view), refreshes the outline and colours what the ide module's semantic
 * highlighter finds (layer and option names, units, optics symbols, rule references; {@link DeckStyles})
 * over the keyword colours. Ctrl+Space proposes completions from
 * the ide module; Format Deck (Ctrl+Shift+F) runs the language's formatter; hovering in a layer's rule
 * block (or Show Information, F2, with the caret there) shows the k1 of its pitch under every option.
 */
public final class DeckEditor extends TextEditor {

    /** The editor's id in plugin.xml. */
    public static final String ID = "org.apertura.ui.editor.deck";
    /** The marker type of deck problems (a problem marker and a text marker). */
    public static final String MARKER = "org.apertura.ui.deckproblem";

    /** Texts of the content assist action. */
    private static final java.util.ResourceBundle ACTION_TEXTS = new java.util.ListResourceBundle() {
        @Override
        protected Object[][] getContents() {
            return new Object[][] {{"ContentAssistProposal.label", "Complete"},
                    {"ContentAssistProposal.tooltip", "Propose what may follow here"},
                    {"ContentAssistProposal.description", "Propose what may follow here"}};
        }
    };

    /**
     * Semantic highlighting of one text: positions of the ide module's calculator.
     *
     * @param text      the text the positions were computed for (they apply only while it is unchanged)
     * @param positions offset, length and style identifier of each position
     */
    private record Highlights(String text, List<Highlight> positions) {
    }

    private record Highlight(int offset, int length, String style) {
    }

    private final Job validation = Job.create("Validating deck", this::validateNow);
    private volatile List<Issue> lastIssues = List.of();
    private volatile EObject lastModel;
    private volatile Highlights highlights = new Highlights("", List.of());
    private final ITextPresentationListener semanticColours = this::applyHighlights;
    private Outline outline;
    private final IDocumentListener changes = new IDocumentListener() {
        @Override
        public void documentAboutToBeChanged(DocumentEvent event) {
        }

        @Override
        public void documentChanged(DocumentEvent event) {
            validation.cancel();
            validation.schedule(400);
        }
    };

    public DeckEditor() {
        setSourceViewerConfiguration(new DeckViewerConfiguration(this));
        validation.setSystem(true);
    }

    @Override
    protected void doSetInput(IEditorInput input) throws CoreException {
        IDocument old = getDocumentProvider() == null ? null : getDocumentProvider().getDocument(getEditorInput());
        if (old != null) {
            old.removeDocumentListener(changes);
        }
        super.doSetInput(input);
        IDocument doc = getDocumentProvider().getDocument(input);
        if (doc != null) {
            doc.addDocumentListener(changes);
        }
        validation.schedule();
    }

    @Override
    protected void createActions() {
        super.createActions();
        ContentAssistAction assist = new ContentAssistAction(ACTION_TEXTS, "ContentAssistProposal.", this);
        assist.setActionDefinitionId(ITextEditorActionDefinitionIds.CONTENT_ASSIST_PROPOSALS);
        setAction("ContentAssistProposal", assist);
        markAsStateDependentAction("ContentAssistProposal", true);
    }

    @Override
    public void createPartControl(Composite parent) {
        super.createPartControl(parent);
        if (getSourceViewer() instanceof ITextViewerExtension4 v) {
            v.addTextPresentationListener(semanticColours);
        }
    }

    /** Draws the semantic positions over the lexical colours, when they belong to the text shown. */
    private void applyHighlights(TextPresentation presentation) {
        Highlights h = highlights;
        IDocument doc = getDocumentProvider() == null ? null : getDocumentProvider().getDocument(getEditorInput());
        if (doc == null || h.positions().isEmpty() || !h.text().equals(doc.get())) {
            return;
        }
        IRegion extent = presentation.getExtent();
        int from = extent.getOffset();
        int to = from + extent.getLength();
        org.eclipse.swt.widgets.Display display = getSourceViewer().getTextWidget().getDisplay();
        for (Highlight p : h.positions()) {
            if (p.offset() + p.length() <= from || p.offset() >= to || p.length() <= 0) {
                continue;
            }
            DeckStyles.of(p.style()).ifPresent(style -> {
                int start = Math.max(from, p.offset());
                int end = Math.min(to, p.offset() + p.length());
                StyleRange range = new StyleRange(start, end - start, new Color(display, style.colour()), null,
                        style.fontStyle());
                presentation.mergeStyleRange(range);
            });
        }
    }

    /** The semantic style identifiers at an offset of the text last highlighted, for tests. */
    public List<String> highlightStylesAt(int offset) {
        return highlights.positions().stream().filter(p -> p.offset() <= offset && offset < p.offset() + p.length())
                .map(Highlight::style).toList();
    }

    private List<Highlight> computeHighlights(XtextResource resource, CancelIndicator cancel) {
        List<Highlight> out = new ArrayList<>();
        DeckLanguage.get().highlight(resource, (offset, length, ids) -> {
            for (String id : ids) {
                out.add(new Highlight(offset, length, id));
            }
        }, cancel);
        return List.copyOf(out);
    }

    /** The file system path of the deck, if it has one. */
    public Optional<Path> path() {
        return org.apertura.ui.layout.LayoutEditor.pathOf(getEditorInput());
    }

    /** The EMF URI the deck is parsed under, so that imports resolve beside the file. */
    URI uri() {
        return path().map(p -> URI.createFileURI(p.toAbsolutePath().toString()))
                .orElse(URI.createURI("memory:/deck.apdeck"));
    }

    /** The document's text. */
    public String text() {
        return getDocumentProvider().getDocument(getEditorInput()).get();
    }

    /** The issues of the last validation. */
    public List<Issue> issues() {
        return lastIssues;
    }

    /** True while a validation is scheduled or running. */
    public boolean isValidating() {
        return validation.getState() != Job.NONE;
    }

    private IStatus validateNow(IProgressMonitor monitor) {
        String text;
        try {
            text = getSourceViewerText();
        } catch (IllegalStateException e) {
            return Status.CANCEL_STATUS;
        }
        if (text == null) {
            return Status.OK_STATUS;
        }
        try {
            XtextResource resource = DeckLanguage.get().parse(text, uri());
            CancelIndicator cancel = monitor::isCanceled;
            List<Issue> issues = DeckLanguage.get().validate(resource, cancel);
            if (monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            List<Highlight> positions = computeHighlights(resource, cancel);
            if (monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            lastIssues = List.copyOf(issues);
            lastModel = resource.getContents().isEmpty() ? null : resource.getContents().get(0);
            highlights = new Highlights(text, positions);
            updateMarkers(issues);
            Composite c = getSourceViewer() == null ? null : getSourceViewer().getTextWidget();
            if (c != null && !c.isDisposed()) {
                c.getDisplay().asyncExec(() -> {
                    if (outline != null) {
                        outline.refresh(lastModel);
                    }
                    ISourceViewer v = getSourceViewer();
                    if (v != null && v.getTextWidget() != null && !v.getTextWidget().isDisposed()) {
                        v.invalidateTextPresentation();
                    }
                });
            }
            return Status.OK_STATUS;
        } catch (IOException | RuntimeException e) {
            return Status.error("Validating " + getEditorInput().getName() + " failed: " + e.getMessage(), e);
        }
    }

    private String getSourceViewerText() {
        IDocument doc = getDocumentProvider() == null ? null : getDocumentProvider().getDocument(getEditorInput());
        return doc == null ? null : doc.get();
    }

    private void updateMarkers(List<Issue> issues) {
        if (!(getEditorInput() instanceof IFileEditorInput fi)) {
            return;
        }
        IFile file = fi.getFile();
        IWorkspaceRunnable update = m -> {
            if (!file.exists()) {
                return;
            }
            file.deleteMarkers(MARKER, false, IResource.DEPTH_ZERO);
            for (Issue issue : issues) {
                IMarker marker = file.createMarker(MARKER);
                int severity = switch (issue.getSeverity()) {
                    case ERROR -> IMarker.SEVERITY_ERROR;
                    case WARNING -> IMarker.SEVERITY_WARNING;
                    default -> IMarker.SEVERITY_INFO;
                };
                int offset = issue.getOffset() == null ? 0 : issue.getOffset();
                int length = issue.getLength() == null ? 0 : issue.getLength();
                marker.setAttributes(new String[] {IMarker.SEVERITY, IMarker.MESSAGE, IMarker.LINE_NUMBER,
                        IMarker.CHAR_START, IMarker.CHAR_END, "code"},
                        new Object[] {severity, issue.getMessage(), issue.getLineNumber() == null ? 1 : issue.getLineNumber(),
                                offset, offset + length, issue.getCode() == null ? "" : issue.getCode()});
            }
        };
        try {
            ResourcesPlugin.getWorkspace().run(update, file, IResource.NONE, null);
        } catch (CoreException e) {
            // the file went away while validating; its markers went with it
        }
    }

    /** Replaces the text by its formatted form (a deck with syntax errors is left as it is). */
    public void format() {
        IDocument doc = getDocumentProvider().getDocument(getEditorInput());
        try {
            String formatted = DeckLanguage.get().format(doc.get(), uri());
            if (!formatted.equals(doc.get())) {
                doc.replace(0, doc.getLength(), formatted);
            }
        } catch (IOException | BadLocationException e) {
            org.eclipse.jface.dialogs.MessageDialog.openError(getSite().getShell(), "Format deck",
                    "Could not format: " + e.getMessage());
        }
    }

    /**
     * The completion proposals at an offset, as the editor's content assistant computes them for
     * Ctrl+Space (must run on the UI thread).
     */
    public ICompletionProposal[] proposalsAt(int offset) {
        ISourceViewer v = getSourceViewer();
        IContentAssistant assistant = getSourceViewerConfiguration().getContentAssistant(v);
        ICompletionProposal[] out = assistant.getContentAssistProcessor(IDocument.DEFAULT_CONTENT_TYPE)
                .computeCompletionProposals(v, offset);
        return out == null ? new ICompletionProposal[0] : out;
    }

    /** The hover text at an offset, as the editor's text hover computes it; null where there is none. */
    public String hoverAt(int offset) {
        ISourceViewer v = getSourceViewer();
        ITextHover hover = getSourceViewerConfiguration().getTextHover(v, IDocument.DEFAULT_CONTENT_TYPE);
        return hover.getHoverInfo(v, hover.getHoverRegion(v, offset));
    }

    /** The source viewer, for tests. */
    public ISourceViewer viewer() {
        return getSourceViewer();
    }

    @Override
    public <T> T getAdapter(Class<T> type) {
        if (type == IContentOutlinePage.class) {
            if (outline == null) {
                outline = new Outline();
            }
            return type.cast(outline);
        }
        return super.getAdapter(type);
    }

    @Override
    public void dispose() {
        validation.cancel();
        if (getSourceViewer() instanceof ITextViewerExtension4 v) {
            v.removeTextPresentationListener(semanticColours);
        }
        IDocument doc = getDocumentProvider() == null ? null : getDocumentProvider().getDocument(getEditorInput());
        if (doc != null) {
            doc.removeDocumentListener(changes);
        }
        super.dispose();
    }

    /** Options, layers and rule blocks of the deck: every element that has a name. */
    private final class Outline extends ContentOutlinePage {
        @Override
        public void createControl(Composite parent) {
            super.createControl(parent);
            TreeViewer tree = getTreeViewer();
            tree.setContentProvider(new ITreeContentProvider() {
                @Override
                public Object[] getElements(Object input) {
                    return input instanceof EObject e ? named(e) : new Object[0];
                }

                @Override
                public Object[] getChildren(Object parent) {
                    return parent instanceof EObject e ? named(e) : new Object[0];
                }

                @Override
                public Object getParent(Object element) {
                    return element instanceof EObject e ? e.eContainer() : null;
                }

                @Override
                public boolean hasChildren(Object element) {
                    return getChildren(element).length > 0;
                }
            });
            tree.setLabelProvider(new LabelProvider() {
                @Override
                public String getText(Object element) {
                    return element instanceof EObject e ? label(e) : String.valueOf(element);
                }
            });
            tree.setInput(lastModel);
            tree.addDoubleClickListener(e -> {
                Object first = tree.getStructuredSelection().getFirstElement();
                if (first instanceof EObject eo) {
                    org.eclipse.xtext.nodemodel.ICompositeNode node = org.eclipse.xtext.nodemodel.util.NodeModelUtils
                            .getNode(eo);
                    if (node != null) {
                        selectAndReveal(node.getOffset(), node.getLength());
                    }
                }
            });
        }

        void refresh(EObject model) {
            if (getTreeViewer() != null && !getTreeViewer().getControl().isDisposed()) {
                getTreeViewer().setInput(model);
                getTreeViewer().expandToLevel(2);
            }
        }
    }

    /** Children worth listing: those with a name, or those containing named elements. */
    static Object[] named(EObject parent) {
        List<Object> out = new ArrayList<>();
        for (EObject child : parent.eContents()) {
            if (name(child) != null || named(child).length > 0) {
                out.add(child);
            }
        }
        return out.toArray();
    }

    static String name(EObject e) {
        EStructuralFeature f = e.eClass().getEStructuralFeature("name");
        Object v = f == null ? null : e.eGet(f);
        if (v instanceof String s) {
            return s;
        }
        EStructuralFeature layer = e.eClass().getEStructuralFeature("layer");
        Object l = layer == null ? null : e.eGet(layer);
        return l instanceof EObject le ? name(le) : null;
    }

    static String label(EObject e) {
        String n = name(e);
        String kind = e.eClass().getName();
        return n == null ? kind : kind + " " + n;
    }
}
